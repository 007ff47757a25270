import { Button } from '@radix-ui/themes';
import { createSourceSchema, type ClaimSourceView } from '@skyledger/contracts';
import { z } from 'zod';
import type { ShowNotice } from '@/components/ui/toaster';
import { useUpdateSource } from '../../../api/update-source';
import { FormDialog } from '../../shared/form-dialog';
import { useFormDialog } from '../../shared/use-form-dialog';
import { GradeFields } from './grade-fields';

const schema = z.object({
  grade: createSourceSchema.shape.grade,
  gradeReason: createSourceSchema.shape.gradeReason,
});

const staleSourceMessage =
  'Someone else changed this source meanwhile, so the new grade was not saved. It now shows as it stands: check it, then try again.';

interface RegradeDialogProps {
  claimId: string;
  source: ClaimSourceView;
  onNotice: ShowNotice;
}

/** A new grade and its reason; the source changes for every claim that cites it. */
export function RegradeDialog({ claimId, source, onNotice }: RegradeDialogProps) {
  const update = useUpdateSource(claimId);
  const { form, dialog } = useFormDialog({
    schema,
    initial: () => ({ grade: source.grade, gradeReason: source.gradeReason }),
    send: (values) =>
      update.mutateAsync({ sourceId: source.id, ...values, version: source.version }),
    onSent: () => onNotice({ tone: 'success', text: `“${source.title}” is regraded.` }),
    apiErrors: { fields: ['grade', 'gradeReason'], statusMessages: { 409: staleSourceMessage } },
  });

  return (
    <FormDialog
      trigger={
        <Button
          size="1"
          variant="soft"
          color="gray"
          highContrast
          aria-label={`Regrade “${source.title}”`}
        >
          Regrade
        </Button>
      }
      title="Regrade the source"
      description={`“${source.title}”. The grade is the source's, on every claim that cites it.`}
      submitLabel="Save the grade"
      {...dialog}
    >
      <GradeFields control={form.control} register={form.register} />
    </FormDialog>
  );
}
