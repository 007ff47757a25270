import { PlusIcon } from '@radix-ui/react-icons';
import { Button } from '@radix-ui/themes';
import { z } from 'zod';
import { ControlledCheckbox } from '@/components/ui/controlled-checkbox';
import type { ShowNotice } from '@/components/ui/toaster';
import { useDeskTimeZone } from '@/lib/desk-time-zone';
import { useAddAppearance } from '../../../api/add-appearance';
import {
  appearanceFormField,
  appearanceFormSchema,
  emptyAppearance,
  toAppearanceRequest,
} from '../../../forms/appearance-form';
import { AppearanceFields } from '../../shared/appearance-fields';
import { FormDialog } from '../../shared/form-dialog';
import { useFormDialog } from '../../shared/use-form-dialog';

const schema = z.object({ appearance: appearanceFormSchema, isFirstKnown: z.boolean() });

export function AddAppearanceDialog({
  claimId,
  onNotice,
}: {
  claimId: string;
  onNotice: ShowNotice;
}) {
  const add = useAddAppearance(claimId);
  const deskTimeZone = useDeskTimeZone();
  const { form, dialog } = useFormDialog({
    schema,
    initial: () => ({ appearance: emptyAppearance(deskTimeZone), isFirstKnown: false }),
    send: (values) =>
      add.mutateAsync({
        ...toAppearanceRequest(values.appearance),
        isFirstKnown: values.isFirstKnown,
      }),
    onSent: (added) => onNotice({ tone: 'success', text: `Appearance on ${added.outlet} added.` }),
    apiErrors: {
      fields: [
        'appearance.url',
        'appearance.outlet',
        'appearance.seenAtLocal',
        'appearance.seenTimeZone',
        'isFirstKnown',
      ],
      formField: (field) =>
        field === 'isFirstKnown' ? field : appearanceFormField(field, 'appearance'),
    },
  });

  return (
    <FormDialog
      trigger={
        <Button highContrast>
          <PlusIcon aria-hidden />
          Add an appearance
        </Button>
      }
      title="Add an appearance"
      description="Another place the claim was seen. A capture can be attached once it is added."
      submitLabel="Add the appearance"
      {...dialog}
    >
      <AppearanceFields control={form.control} register={form.register} />
      <ControlledCheckbox
        control={form.control}
        name="isFirstKnown"
        label="This is the first known appearance"
        hint="It takes the mark from any other appearance"
      />
    </FormDialog>
  );
}
