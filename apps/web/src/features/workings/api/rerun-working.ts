import type { WorkingRerunResponse } from '@skyledger/contracts';
import { api } from '@/lib/api-client';
import { useWorkingMutation } from './use-working-mutation';

export interface RerunWorkingInput {
  workingId: string;
  version: number;
}

/** Runs a working again with the library the server now has; says which outputs changed. */
export function rerunWorking(
  claimId: string,
  { workingId, version }: RerunWorkingInput,
): Promise<WorkingRerunResponse> {
  return api.post<WorkingRerunResponse>(
    `/claims/${encodeURIComponent(claimId)}/workings/${encodeURIComponent(workingId)}/rerun`,
    { version },
  );
}

export function useRerunWorking(claimId: string) {
  return useWorkingMutation(claimId, (input: RerunWorkingInput) => rerunWorking(claimId, input));
}
