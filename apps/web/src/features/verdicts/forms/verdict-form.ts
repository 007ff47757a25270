import {
  updateVerdictVersionSchema,
  type UpdateVerdictVersionRequest,
  type VerdictVersionView,
} from '@skyledger/contracts';
import { z } from 'zod';
import type { FieldCodeOverrides } from '@/lib/api-error-messages';

/**
 * The verdict's fields beside the explainer. Selects hold '' for "none chosen yet"; the
 * bottom line follows the API's rule, and is one paragraph, as readers see it.
 */
export const verdictFormSchema = z.object({
  ratingId: z.string(),
  bottomLine: updateVerdictVersionSchema.shape.bottomLine
    .unwrap()
    .refine((text) => !/\n/.test(text), {
      error: 'Keep the bottom line to one paragraph, with no line breaks',
    }),
  primarySourceId: z.string(),
});
export type VerdictForm = z.input<typeof verdictFormSchema>;

export function toVerdictForm(
  version: Pick<VerdictVersionView, 'ratingId' | 'bottomLine' | 'primarySourceId'>,
): VerdictForm {
  return {
    ratingId: version.ratingId ?? '',
    bottomLine: version.bottomLine,
    primarySourceId: version.primarySourceId ?? '',
  };
}

export function toVerdictFields(
  form: z.output<typeof verdictFormSchema>,
): Required<Pick<UpdateVerdictVersionRequest, 'ratingId' | 'bottomLine' | 'primarySourceId'>> {
  return {
    ratingId: form.ratingId || null,
    bottomLine: form.bottomLine,
    primarySourceId: form.primarySourceId || null,
  };
}

export const verdictFormFields = ['ratingId', 'bottomLine', 'primarySourceId'] as const;

export const verdictCodeMessages: FieldCodeOverrides = {
  ratingId: { unknownRating: 'Choose a level on the rating scale' },
  primarySourceId: { notOnClaim: 'Choose one of the claim’s sources' },
};
