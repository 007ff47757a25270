import { searchQuerySchema, type SearchQuery } from '@skyledger/contracts';
import { readUrlQuery, writeUrlQuery } from '@/lib/url-query';

/** A search as the page's URL holds it; nothing is asked until it has words (`q`). */
export type SearchView = Partial<SearchQuery>;

export type SearchFilter = 'type' | 'status' | 'topic' | 'from' | 'to';
const filterKeys: readonly SearchFilter[] = ['type', 'status', 'topic', 'from', 'to'];

export function parseSearchUrl(searchParams: URLSearchParams): SearchView {
  return readUrlQuery(searchQuerySchema, searchParams);
}

export function searchUrlParams(view: SearchView): URLSearchParams {
  return writeUrlQuery(searchQuerySchema, view, { page: 1 });
}

export function isSearchable(view: SearchView): view is SearchQuery {
  return Boolean(view.q);
}

/** The same search with some parts changed; any change but of page goes back to page 1. */
export function withChanges(view: SearchView, changes: SearchView): SearchView {
  const next: SearchView = { ...view, ...changes };
  if (!('page' in changes)) delete next.page;
  return next;
}

/** True when the search is narrowed by a facet or a date. */
export function isFiltered(view: SearchView): boolean {
  return filterKeys.some((key) => view[key] !== undefined);
}

export const noFilters: Record<SearchFilter, undefined> = {
  type: undefined,
  status: undefined,
  topic: undefined,
  from: undefined,
  to: undefined,
};
