import { z } from 'zod';
import { claimStatusSchema, type ClaimStatus } from './claim-life.js';
import { dateSchema } from './common.js';
import { topicSchema } from './claims.js';

/** What the desk's search finds; readers only ever see published explainers. */
export const searchDocumentTypes = ['claim', 'source', 'explainer'] as const;
export type SearchDocumentType = (typeof searchDocumentTypes)[number];
export const searchDocumentTypeLabels: Record<SearchDocumentType, string> = {
  claim: 'Claims',
  source: 'Sources',
  explainer: 'Explainers',
};

export const SEARCH_QUERY_MAX_LENGTH = 200;
export const SEARCH_PAGE_SIZE = 20;

export const searchQuerySchema = z.object({
  q: z
    .string()
    .trim()
    .min(1, { error: 'Type something to search for' })
    .max(SEARCH_QUERY_MAX_LENGTH),
  type: z.enum(searchDocumentTypes).optional(),
  status: claimStatusSchema.optional(),
  topic: topicSchema.optional(),
  /** Rating id of a published explainer (the rating scale comes with the verdicts). */
  rating: z.string().max(40).optional(),
  from: dateSchema.optional(),
  to: dateSchema.optional(),
  page: z.coerce.number().int().min(1).max(500).optional(),
});
export type SearchQuery = z.infer<typeof searchQuerySchema>;

/** A piece of text cut into runs, with the runs that matched the query marked. */
export type Highlight = Array<{ text: string; match: boolean }>;

export interface SearchHit {
  type: SearchDocumentType;
  /** The id of the claim, source or explainer. */
  id: string;
  title: Highlight;
  /** The best matching passage of the longer text, if any word matched there. */
  snippet: Highlight | null;
  status: ClaimStatus | null;
  topics: string[];
  rating: string | null;
  /** Filed (claims), added (sources) or published (explainers). */
  date: string;
  score: number;
}

export type FacetCounts = Record<string, number>;

export interface SearchResponse {
  items: SearchHit[];
  total: number;
  page: number;
  pageSize: number;
  facets: { type: FacetCounts; status: FacetCounts; topics: FacetCounts };
}

export const SIMILAR_TEXT_MIN_LENGTH = 12;
export const similarClaimsQuerySchema = z.object({
  text: z.string().trim().min(SIMILAR_TEXT_MIN_LENGTH).max(4000),
});
export type SimilarClaimsQuery = z.infer<typeof similarClaimsQuerySchema>;

/** An earlier claim close to one being typed, with where the desk got to with it. */
export interface SimilarClaim {
  id: string;
  summary: string;
  status: ClaimStatus;
  claimantName: string;
  filedAt: string;
  /** The rating level's id and the reader page, while its explainer is published. */
  rating: string | null;
  explainerUrl: string | null;
  score: number;
}

/** What a rebuild of the search index did. */
export interface SearchReindexResponse {
  documents: number;
  milliseconds: number;
}
