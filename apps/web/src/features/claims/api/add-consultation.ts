import type { ConsultationView, CreateConsultationRequest } from '@skyledger/contracts';
import { api } from '@/lib/api-client';
import { useClaimMutation } from './use-claim-mutation';

export function addConsultation(
  claimId: string,
  body: CreateConsultationRequest,
): Promise<ConsultationView> {
  return api.post<ConsultationView>(`/claims/${encodeURIComponent(claimId)}/consultations`, body);
}

export function useAddConsultation(claimId: string) {
  return useClaimMutation(claimId, (body: CreateConsultationRequest) =>
    addConsultation(claimId, body),
  );
}
