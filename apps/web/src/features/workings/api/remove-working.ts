import { api } from '@/lib/api-client';
import { useWorkingMutation } from './use-working-mutation';

export function removeWorking(claimId: string, workingId: string): Promise<void> {
  return api.delete(
    `/claims/${encodeURIComponent(claimId)}/workings/${encodeURIComponent(workingId)}`,
  );
}

export function useRemoveWorking(claimId: string) {
  return useWorkingMutation(claimId, (workingId: string) => removeWorking(claimId, workingId));
}
