import {
  CLAIM_PAGE_SIZE_DEFAULT,
  claimQueueQuerySchema,
  type ClaimQueueQuery,
  type ClaimSortField,
} from '@skyledger/contracts';
import { readUrlQuery, writeUrlQuery } from '@/lib/url-query';

type QueueKey = keyof ClaimQueueQuery;
const queueKeys = Object.keys(claimQueueQuerySchema.shape) as QueueKey[];

export const queueDefaults = {
  sort: 'filedAt',
  order: 'desc',
  page: 1,
  pageSize: CLAIM_PAGE_SIZE_DEFAULT,
} as const satisfies ClaimQueueQuery;

/** The queue's filters from the page's URL, each checked by the API's own schema. */
export function parseQueueSearch(searchParams: URLSearchParams): ClaimQueueQuery {
  return readUrlQuery(claimQueueQuerySchema, searchParams);
}

/** The URL search parameters for a queue view, in one order, leaving out the defaults. */
export function queueSearchParams(query: ClaimQueueQuery): URLSearchParams {
  return writeUrlQuery(claimQueueQuerySchema, query, queueDefaults);
}

/** The same view with some filters changed; any change of filter goes back to page 1. */
export function withFilters(
  query: ClaimQueueQuery,
  changes: Partial<Record<QueueKey, ClaimQueueQuery[QueueKey] | undefined>>,
): ClaimQueueQuery {
  const next: ClaimQueueQuery = { ...query, ...changes } as ClaimQueueQuery;
  if (!('page' in changes)) delete next.page;
  for (const key of queueKeys) if (next[key] === undefined) delete next[key];
  return next;
}

/** Dates read best newest first; statuses and summaries from the top of the list. */
export const firstOrder: Record<ClaimSortField, 'asc' | 'desc'> = {
  filedAt: 'desc',
  updatedAt: 'desc',
  status: 'asc',
  summary: 'asc',
};

/** True when a view narrows the queue in any way (sorting and paging aside). */
export function isFiltered(query: ClaimQueueQuery): boolean {
  return queueKeys.some(
    (key) => !['sort', 'order', 'page', 'pageSize'].includes(key) && query[key] !== undefined,
  );
}
