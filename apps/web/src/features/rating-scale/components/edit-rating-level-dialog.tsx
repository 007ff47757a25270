import { Button } from '@radix-ui/themes';
import type { RatingLevelView } from '@skyledger/contracts';
import type { ShowNotice } from '@/components/ui/toaster';
import { FormDialog } from '@/features/claims/components/shared/form-dialog';
import { useFormDialog } from '@/features/claims/components/shared/use-form-dialog';
import { useUpdateRatingLevel } from '../api/update-rating-level';
import {
  ratingLevelWordsForm,
  ratingLevelWordsSchema,
  staleRatingLevelMessage,
} from '../forms/rating-level-form';
import { RatingLevelWordsFields } from './rating-level-words-fields';

interface EditRatingLevelDialogProps {
  level: RatingLevelView;
  onNotice: ShowNotice;
}

/** A desk chief rewords a level; its id and number stay, so verdicts keep their rating. */
export function EditRatingLevelDialog({ level, onNotice }: EditRatingLevelDialogProps) {
  const update = useUpdateRatingLevel();
  const { form, dialog } = useFormDialog({
    schema: ratingLevelWordsSchema,
    initial: () => ratingLevelWordsForm(level),
    // The version is read when sending: after a 409 the reloaded level brings the new one.
    send: (words) => update.mutateAsync({ id: level.id, ...words, version: level.version }),
    onSent: (saved) => onNotice({ tone: 'success', text: `“${saved.label}” is saved.` }),
    apiErrors: {
      fields: ['label', 'description'],
      statusMessages: { 409: staleRatingLevelMessage },
    },
  });
  const { errors } = form.formState;
  return (
    <FormDialog
      trigger={
        <Button variant="soft" color="gray" highContrast aria-label={`Edit “${level.label}”`}>
          Edit words
        </Button>
      }
      title={`Edit “${level.label}”`}
      description="Readers see these words on the methodology page and beside every verdict with this rating."
      submitLabel="Save the words"
      {...dialog}
    >
      <RatingLevelWordsFields
        label={{ ...form.register('label'), error: errors.label?.message }}
        description={{ ...form.register('description'), error: errors.description?.message }}
      />
    </FormDialog>
  );
}
