import type { ClaimDetail, CreateClaimRequest } from '@skyledger/contracts';
import { api } from '@/lib/api-client';

/** `POST /api/claims`; the filing form uses it through `useFileClaim` (file-claim-with-capture). */
export function fileClaim(body: CreateClaimRequest): Promise<ClaimDetail> {
  return api.post<ClaimDetail>('/claims', body);
}
