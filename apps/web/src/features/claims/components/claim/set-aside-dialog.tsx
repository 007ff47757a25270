import { Button } from '@radix-ui/themes';
import {
  claimTransitionSchema,
  setAsideReasonLabels,
  setAsideReasons,
  type ClaimDetail,
} from '@skyledger/contracts';
import { z } from 'zod';
import { ControlledSelect } from '@/components/ui/controlled-select';
import type { ShowNotice } from '@/components/ui/toaster';
import { TextAreaField } from '@/components/ui/text-area-field';
import { useTransitionClaim } from '../../api/transition-claim';
import { optionalText } from '../../forms/form-rules';
import { FormDialog } from '../shared/form-dialog';
import { useFormDialog } from '../shared/use-form-dialog';
import { staleClaimMessage } from './claim-messages';

const reasonOptions = setAsideReasons.map((reason) => ({
  value: reason,
  label: setAsideReasonLabels[reason],
}));

const schema = z.object({
  reason: z
    .enum([...setAsideReasons, ''])
    .pipe(z.enum(setAsideReasons, { error: 'Choose why it is set aside' })),
  note: claimTransitionSchema.shape.note.unwrap(),
});

/** A desk chief takes a claim off the desk, with the reason; it stays on the record. */
export function SetAsideDialog({ claim, onNotice }: { claim: ClaimDetail; onNotice: ShowNotice }) {
  const transition = useTransitionClaim(claim.id);
  const { form, dialog } = useFormDialog({
    schema,
    initial: (): z.input<typeof schema> => ({ reason: '', note: '' }),
    send: ({ reason, note }) =>
      transition.mutateAsync({
        to: 'set_aside',
        reason,
        note: optionalText(note),
        version: claim.version,
      }),
    onSent: () => onNotice({ tone: 'success', text: 'The claim is set aside.' }),
    apiErrors: { fields: ['reason', 'note'], statusMessages: { 409: staleClaimMessage } },
  });
  return (
    <FormDialog
      trigger={
        <Button variant="soft" color="red" highContrast>
          Set aside
        </Button>
      }
      title="Set the claim aside"
      description="It leaves the queue's open work; everything done on it stays on the record."
      submitLabel="Set it aside"
      {...dialog}
    >
      <ControlledSelect
        control={form.control}
        name="reason"
        label="Why"
        options={reasonOptions}
        placeholder="Choose a reason"
      />
      <TextAreaField
        label="Note (optional)"
        hint="e.g. which earlier claim it duplicates"
        rows={3}
        error={form.formState.errors.note?.message}
        {...form.register('note')}
      />
    </FormDialog>
  );
}
