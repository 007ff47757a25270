import type { SearchReindexResponse } from '@skyledger/contracts';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { searchKeys } from './search-keys';

/** Rebuilds the search index from the database (desk chief only). */
export function reindexSearch(): Promise<SearchReindexResponse> {
  return api.post<SearchReindexResponse>('/search/reindex');
}

export function useReindexSearch() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: reindexSearch,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: searchKeys.all }),
  });
}
