import type { SearchQuery, SearchResponse } from '@skyledger/contracts';
import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { searchKeys } from './search-keys';

/** One page of the desk's search over claims, sources and explainers, with facet counts. */
export function searchDesk(query: SearchQuery, signal?: AbortSignal): Promise<SearchResponse> {
  return api.get<SearchResponse>('/search', { params: { ...query }, signal });
}

export const searchQueryOptions = (query: SearchQuery) =>
  queryOptions({
    queryKey: searchKeys.result(query),
    queryFn: ({ signal }) => searchDesk(query, signal),
    // The last results stay on screen, dimmed, while a new facet or page loads.
    placeholderData: keepPreviousData,
  });

export function useSearchDesk(query: SearchQuery) {
  return useQuery(searchQueryOptions(query));
}
