import {
  createRatingLevelSchema,
  type CreateRatingLevelRequest,
  type RatingLevelView,
} from '@skyledger/contracts';
import { z } from 'zod';
import type { FieldCodeOverrides } from '@/lib/api-error-messages';

/** The words of a level, as the desk chief edits them; the rules are the API's own. */
export const ratingLevelWordsSchema = createRatingLevelSchema.pick({
  label: true,
  description: true,
});
export type RatingLevelWordsForm = z.input<typeof ratingLevelWordsSchema>;

export function ratingLevelWordsForm(level: RatingLevelView): RatingLevelWordsForm {
  return { label: level.label, description: level.description };
}

// A number field holds text; empty means the level has no number (an outcome, not a rating).
const levelNumber = z
  .string()
  .trim()
  .transform((text, ctx) => {
    if (text === '') return null;
    const number = Number(text);
    if (!Number.isInteger(number)) {
      ctx.addIssue({ code: 'custom', message: 'Enter a whole number, or leave it empty' });
      return z.NEVER;
    }
    return number;
  });

/** A new level: typed as text, then checked by the request's own schema. */
export const newRatingLevelFormSchema = z
  .object({
    id: z.string(),
    number: levelNumber,
    label: z.string(),
    description: z.string(),
    isRating: z.boolean(),
  })
  .pipe(createRatingLevelSchema);
export type NewRatingLevelForm = z.input<typeof newRatingLevelFormSchema>;

export const emptyNewRatingLevelForm = (): NewRatingLevelForm => ({
  id: '',
  number: '',
  label: '',
  description: '',
  isRating: true,
});

export const newRatingLevelFormFields = [
  'id',
  'number',
  'label',
  'description',
  'isRating',
] as const satisfies readonly (keyof CreateRatingLevelRequest)[];

export const ratingLevelCodeMessages: FieldCodeOverrides = {
  id: { taken: 'The scale already has a level with this id' },
  number: { taken: 'Another level already has this number' },
};

/** Said when another desk chief changed the level first: nothing was saved. */
export const staleRatingLevelMessage =
  'Someone else changed this level meanwhile, so your words were not saved. The scale now shows it as it stands: check it, then save again.';
