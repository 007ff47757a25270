import type { UpdateWorkingRequest, WorkingView } from '@skyledger/contracts';
import { api } from '@/lib/api-client';
import { useWorkingMutation } from './use-working-mutation';

export interface UpdateWorkingNoteInput extends UpdateWorkingRequest {
  workingId: string;
}

/** Only the note of a saved working changes; other inputs make a new working. */
export function updateWorkingNote(
  claimId: string,
  { workingId, ...body }: UpdateWorkingNoteInput,
): Promise<WorkingView> {
  return api.patch<WorkingView>(
    `/claims/${encodeURIComponent(claimId)}/workings/${encodeURIComponent(workingId)}`,
    body,
  );
}

export function useUpdateWorkingNote(claimId: string) {
  return useWorkingMutation(claimId, (input: UpdateWorkingNoteInput) =>
    updateWorkingNote(claimId, input),
  );
}
