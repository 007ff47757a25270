import { type ClaimStatus, type SearchDocumentType } from '@skyledger/contracts';

/**
 * One searchable record, the same for every engine. Text fields are searched with the
 * boosts of `searchFields`; the rest are for filters, facets and display.
 */
export interface SearchDocument {
  /** `<type>-<uuid>`: unique across types, and a valid Meilisearch document id. */
  id: string;
  type: SearchDocumentType;
  entityId: string;
  /** Claim summary, source title or explainer title. */
  title: string;
  /** Claim text as said, or an explainer's bottom line. */
  text: string;
  claimant: string;
  /** Topic tags, space-joined for searching; the list is kept in `topicList`. */
  topics: string;
  topicList: string[];
  authors: string;
  publisher: string;
  /** An explainer's body as plain text. */
  body: string;
  status: ClaimStatus | null;
  rating: string | null;
  /** Epoch milliseconds: filed, added or published. */
  date: number;
  /** `public` documents are the only ones readers may find. */
  audience: 'desk' | 'public';
}

export const documentId = (type: SearchDocumentType, entityId: string) => `${type}-${entityId}`;

/** Searched fields with their weights: summaries and claim text count most, bodies least. */
export const searchFields = {
  title: 3,
  text: 2,
  claimant: 1.5,
  topics: 1.5,
  authors: 1,
  publisher: 1,
  body: 0.75,
} as const satisfies Partial<Record<keyof SearchDocument, number>>;
export type SearchField = keyof typeof searchFields;
export const searchFieldNames = Object.keys(searchFields) as SearchField[];

/**
 * Words the desk treats as the same when searching. Both engines are given this table:
 * MiniSearch expands the query, Meilisearch stores it as its synonyms setting.
 */
export const searchSynonyms: Record<string, string[]> = {
  co2: ['carbon', 'dioxide'],
  ch4: ['methane'],
  n2o: ['nitrous'],
  sun: ['solar'],
  solar: ['sun'],
  geothermal: ['core', 'interior'],
  warming: ['heating'],
  heating: ['warming'],
};
