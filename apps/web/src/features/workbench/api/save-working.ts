import type { CreateWorkingRequest, WorkingView } from '@skyledger/contracts';
import { useWorkingMutation } from '@/features/workings/api/use-working-mutation';
import { api } from '@/lib/api-client';

/** Saves a run on a claim: only the calculator and its inputs; the server computes the rest. */
export function saveWorking(claimId: string, body: CreateWorkingRequest): Promise<WorkingView> {
  return api.post<WorkingView>(`/claims/${encodeURIComponent(claimId)}/workings`, body);
}

export function useSaveWorking(claimId: string) {
  return useWorkingMutation(claimId, (body: CreateWorkingRequest) => saveWorking(claimId, body));
}
