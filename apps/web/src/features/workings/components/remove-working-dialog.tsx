import { TrashIcon } from '@radix-ui/react-icons';
import { Button } from '@radix-ui/themes';
import type { WorkingView } from '@skyledger/contracts';
import { ConfirmDialog } from '@/components/ui/confirm-dialog';
import type { ShowNotice } from '@/components/ui/toaster';
import { changeErrorMessage } from '@/lib/api-error-messages';
import { useRemoveWorking } from '../api/remove-working';
import { staleWorkingMessage } from './working-messages';

interface RemoveWorkingDialogProps {
  claimId: string;
  working: WorkingView;
  title: string;
  onNotice: ShowNotice;
}

/** Takes a working off the claim after a confirmation; the claim's history keeps the record. */
export function RemoveWorkingDialog({
  claimId,
  working,
  title,
  onNotice,
}: RemoveWorkingDialogProps) {
  const remove = useRemoveWorking(claimId);
  return (
    <ConfirmDialog
      trigger={
        <Button size="1" variant="soft" color="red" highContrast>
          <TrashIcon aria-hidden />
          Remove
        </Button>
      }
      title="Remove this working?"
      description={`“${title}” and its note leave the claim. The claim’s history keeps a record that it was there and who removed it.`}
      confirmLabel="Remove the working"
      keepLabel="Cancel"
      color="red"
      maxWidth="460px"
      describeError={(error) => changeErrorMessage(error, staleWorkingMessage)}
      onConfirm={() =>
        remove
          .mutateAsync(working.id)
          .then(() => onNotice({ tone: 'success', text: `The working “${title}” is removed.` }))
      }
    />
  );
}
