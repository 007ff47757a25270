import { PlusIcon } from '@radix-ui/react-icons';
import { Button, Grid } from '@radix-ui/themes';
import { ControlledSelect } from '@/components/ui/controlled-select';
import type { ShowNotice } from '@/components/ui/toaster';
import { TextAreaField } from '@/components/ui/text-area-field';
import { TextInputField } from '@/components/ui/text-input-field';
import { useAddConsultation } from '../../../api/add-consultation';
import {
  consultationFormField,
  consultationFormFields,
  consultationFormSchema,
  emptyConsultationForm,
  toCreateConsultationRequest,
} from '../../../forms/consultation-form';
import { FormDialog } from '../../shared/form-dialog';
import { useFormDialog } from '../../shared/use-form-dialog';

const independenceOptions = [
  { value: 'yes', label: 'Yes: no tie to the claimant' },
  { value: 'no', label: 'No: tied to the claimant' },
] as const;

export function AddConsultationDialog({
  claimId,
  onNotice,
}: {
  claimId: string;
  onNotice: ShowNotice;
}) {
  const add = useAddConsultation(claimId);
  const { form, dialog } = useFormDialog({
    schema: consultationFormSchema,
    initial: () => emptyConsultationForm,
    send: (values) => add.mutateAsync(toCreateConsultationRequest(values)),
    onSent: (added) =>
      onNotice({ tone: 'success', text: `The consultation with ${added.name} is logged.` }),
    apiErrors: { fields: consultationFormFields, formField: consultationFormField },
  });
  const {
    register,
    formState: { errors },
  } = form;

  return (
    <FormDialog
      trigger={
        <Button highContrast>
          <PlusIcon aria-hidden />
          Add a consultation
        </Button>
      }
      title="Add an expert consultation"
      description="Who was asked, what they said, and what they declared."
      submitLabel="Add the consultation"
      maxWidth="640px"
      {...dialog}
    >
      <Grid columns={{ initial: '1', sm: '2' }} gap="4">
        <TextInputField
          label="Name"
          autoComplete="off"
          error={errors.name?.message}
          {...register('name')}
        />
        <TextInputField
          label="Affiliation"
          autoComplete="off"
          error={errors.affiliation?.message}
          {...register('affiliation')}
        />
        <TextInputField
          label="Field of expertise"
          autoComplete="off"
          error={errors.field?.message}
          {...register('field')}
        />
        <TextInputField
          label="Consulted on"
          type="date"
          error={errors.consultedOn?.message}
          {...register('consultedOn')}
        />
      </Grid>
      <TextAreaField
        label="What they said"
        rows={4}
        error={errors.quote?.message}
        {...register('quote')}
      />
      <TextInputField
        label="Declared conflicts"
        hint="What they declared; write “None declared” if nothing"
        autoComplete="off"
        error={errors.declaredConflicts?.message}
        {...register('declaredConflicts')}
      />
      <ControlledSelect
        control={form.control}
        name="independence"
        label="Independent of the claimant?"
        options={independenceOptions}
        placeholder="Choose"
      />
    </FormDialog>
  );
}
