import { type SearchDocumentType, type ClaimStatus } from '@skyledger/contracts';
import { type SearchDocument, type SearchField } from './search-document';

export interface EngineFilters {
  types?: SearchDocumentType[];
  status?: ClaimStatus;
  topic?: string;
  rating?: string;
  /** Epoch ms, inclusive. */
  from?: number;
  /** Epoch ms, exclusive. */
  before?: number;
  audience?: 'public';
}

export interface EngineQuery {
  q: string;
  filters: EngineFilters;
  offset: number;
  limit: number;
  /**
   * `all`: every word must match (the search page); `any`: the closest documents (similar
   * claims), where a large index may leave out those with only the query's commonest words.
   */
  match: 'all' | 'any';
}

export interface EngineHit {
  document: SearchDocument;
  score: number;
  /** The words of the document that matched, lower-cased, per field. */
  matchedTerms: Partial<Record<SearchField, string[]>>;
}

export interface EngineResult {
  hits: EngineHit[];
  total: number;
  /** Counts over the matches of an `all` search; empty for `any`. */
  facets: {
    type: Record<string, number>;
    status: Record<string, number>;
    topics: Record<string, number>;
  };
}

/**
 * One search interface, two engines (an in-process index by default, Meilisearch at
 * scale), chosen by `SEARCH_ENGINE`. Both get the same documents and
 * pass the same behavioural tests.
 */
export abstract class SearchEngine {
  /** True when the index outlives the API process (Meilisearch). */
  abstract readonly persistent: boolean;
  /** Prepares the engine (settings, empty index) before the first use. */
  abstract start(): Promise<void>;
  /** Replaces every document: the full rebuild. */
  abstract replaceAll(documents: SearchDocument[]): Promise<void>;
  /** Adds or replaces these documents; searchable when the promise resolves. */
  abstract upsert(documents: SearchDocument[]): Promise<void>;
  abstract remove(ids: string[]): Promise<void>;
  abstract search(query: EngineQuery): Promise<EngineResult>;
  abstract count(): Promise<number>;
}
