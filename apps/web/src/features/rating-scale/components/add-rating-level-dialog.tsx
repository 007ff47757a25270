import { PlusIcon } from '@radix-ui/react-icons';
import { Button, Grid } from '@radix-ui/themes';
import { Controller } from 'react-hook-form';
import { CheckboxField } from '@/components/ui/checkbox-field';
import type { ShowNotice } from '@/components/ui/toaster';
import { TextInputField } from '@/components/ui/text-input-field';
import { FormDialog } from '@/features/claims/components/shared/form-dialog';
import { useFormDialog } from '@/features/claims/components/shared/use-form-dialog';
import { useCreateRatingLevel } from '../api/create-rating-level';
import {
  emptyNewRatingLevelForm,
  newRatingLevelFormFields,
  newRatingLevelFormSchema,
  ratingLevelCodeMessages,
} from '../forms/rating-level-form';
import { RatingLevelWordsFields } from './rating-level-words-fields';

/** A desk chief adds a level to the scale, or an outcome that is not a rating. */
export function AddRatingLevelDialog({ onNotice }: { onNotice: ShowNotice }) {
  const create = useCreateRatingLevel();
  const { form, dialog } = useFormDialog({
    schema: newRatingLevelFormSchema,
    initial: emptyNewRatingLevelForm,
    send: (level) => create.mutateAsync(level),
    onSent: (added) => onNotice({ tone: 'success', text: `“${added.label}” is on the scale now.` }),
    apiErrors: { fields: newRatingLevelFormFields, overrides: ratingLevelCodeMessages },
  });
  const { errors } = form.formState;
  return (
    <FormDialog
      trigger={
        <Button highContrast>
          <PlusIcon aria-hidden />
          Add a level
        </Button>
      }
      title="Add a level to the scale"
      description="Its id is stored with every verdict that uses it and cannot change later."
      submitLabel="Add the level"
      maxWidth="640px"
      {...dialog}
    >
      <Grid columns={{ initial: '1', sm: '2' }} gap="4">
        <TextInputField
          label="Id"
          hint="Lower-case words joined by hyphens, e.g. too-early"
          autoComplete="off"
          error={errors.id?.message}
          {...form.register('id')}
        />
        <TextInputField
          label="Number on the scale (optional)"
          hint="1 holds up best; leave empty for an outcome that is not a rating"
          inputMode="numeric"
          autoComplete="off"
          error={errors.number?.message}
          {...form.register('number')}
        />
      </Grid>
      <RatingLevelWordsFields
        label={{ ...form.register('label'), error: errors.label?.message }}
        description={{ ...form.register('description'), error: errors.description?.message }}
      />
      <Controller
        control={form.control}
        name="isRating"
        render={({ field }) => (
          <CheckboxField
            label="It is a rating"
            hint="Untick for an outcome such as “not checkable”, which rates nothing"
            name={field.name}
            checked={field.value}
            onCheckedChange={field.onChange}
            buttonRef={field.ref}
          />
        )}
      />
    </FormDialog>
  );
}
