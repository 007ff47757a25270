import type { PublicationView } from '@skyledger/contracts';
import { apiRequest } from '@/lib/api-client';
import { usePublishingMutation } from './use-publishing-mutation';

/** Withdraws a scheduled publication before its time; the claim stays cleared. */
export function cancelSchedule(claimId: string, version: number): Promise<PublicationView[]> {
  return apiRequest<PublicationView[]>(
    `/claims/${encodeURIComponent(claimId)}/publication-schedule`,
    { method: 'DELETE', body: { version } },
  );
}

export function useCancelSchedule(claimId: string) {
  return usePublishingMutation(claimId, (version: number) => cancelSchedule(claimId, version));
}
