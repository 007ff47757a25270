import { SIMILAR_TEXT_MIN_LENGTH, type SimilarClaim } from '@skyledger/contracts';
import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { searchKeys } from './search-keys';

/** Up to five earlier claims closest to a text being typed, closest first. */
export function getSimilarClaims(text: string, signal?: AbortSignal): Promise<SimilarClaim[]> {
  return api.get<SimilarClaim[]>('/claims/similar', { params: { text }, signal });
}

export const similarClaimsQueryOptions = (text: string) =>
  queryOptions({
    queryKey: searchKeys.similarClaims(text),
    // Handing the signal on lets TanStack Query abort the request once the text has moved on.
    queryFn: ({ signal }) => getSimilarClaims(text, signal),
    enabled: text.length >= SIMILAR_TEXT_MIN_LENGTH,
    placeholderData: keepPreviousData,
  });

export function useSimilarClaims(text: string) {
  return useQuery(similarClaimsQueryOptions(text));
}
