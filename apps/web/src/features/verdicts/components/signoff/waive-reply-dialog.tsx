import { Button } from '@radix-ui/themes';
import { replyWaiverSchema, type ClaimDetail } from '@skyledger/contracts';
import type { ShowNotice } from '@/components/ui/toaster';
import { TextAreaField } from '@/components/ui/text-area-field';
import { FormDialog } from '@/features/claims/components/shared/form-dialog';
import { useFormDialog } from '@/features/claims/components/shared/use-form-dialog';
import { useWaiveReply } from '../../api/waive-reply';
import { staleClaimMoveMessage } from '../../verdict-words';

const schema = replyWaiverSchema.pick({ reason: true });

/** A desk chief waives the right of reply, with a reason the checklist and the record keep. */
export function WaiveReplyDialog({
  claim,
  onNotice,
}: {
  claim: ClaimDetail;
  onNotice: ShowNotice;
}) {
  const waive = useWaiveReply(claim.id);
  const { form, dialog } = useFormDialog({
    schema,
    initial: () => ({ reason: '' }),
    send: ({ reason }) => waive.mutateAsync({ reason, version: claim.version }),
    onSent: () => onNotice({ tone: 'success', text: 'The right of reply is waived.' }),
    apiErrors: { fields: ['reason'], statusMessages: { 409: staleClaimMoveMessage } },
  });
  return (
    <FormDialog
      trigger={
        <Button variant="soft" color="gray" highContrast>
          Waive right of reply
        </Button>
      }
      title="Waive the right of reply"
      description="Only when the claimant cannot fairly be asked, e.g. an anonymous post. The reason shows on the checklist and stays on the record."
      submitLabel="Waive it"
      {...dialog}
    >
      <TextAreaField
        label="Why"
        rows={3}
        error={form.formState.errors.reason?.message}
        {...form.register('reason')}
      />
    </FormDialog>
  );
}
