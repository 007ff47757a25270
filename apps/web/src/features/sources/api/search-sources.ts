import type { SourceView } from '@skyledger/contracts';
import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { sourceKeys } from './source-keys';

/** Up to 20 sources whose title, or a word of it, starts with `q`, or with that DOI. */
export function searchSources(q: string): Promise<SourceView[]> {
  return api.get<SourceView[]>('/sources', { params: { q } });
}

export const sourceSearchQueryOptions = (q: string) =>
  queryOptions({
    queryKey: sourceKeys.search(q),
    queryFn: () => searchSources(q),
    enabled: q.length > 0,
    placeholderData: keepPreviousData,
  });

export function useSourceSearch(q: string) {
  return useQuery(sourceSearchQueryOptions(q.trim()));
}
