import type { PublicationView } from '@skyledger/contracts';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { publicationKeys } from './publication-keys';

export function getPublications(claimId: string): Promise<PublicationView[]> {
  return api.get<PublicationView[]>(`/claims/${encodeURIComponent(claimId)}/publications`);
}

export const publicationsQueryOptions = (claimId: string) =>
  queryOptions({
    queryKey: publicationKeys.claim(claimId),
    queryFn: () => getPublications(claimId),
  });

/** Not suspending: the publishing tab shows its own loading state inside the claim page. */
export function usePublications(claimId: string) {
  return useQuery(publicationsQueryOptions(claimId));
}
