import { z } from 'zod';
import { boundedText, versionSchema } from './common.js';

/** A level's id: lower-case words joined by hyphens, e.g. `holds-with-caveats`. */
export const ratingLevelIdSchema = z
  .string()
  .trim()
  .regex(/^[a-z]+(?:-[a-z]+)*$/, { error: 'Use lower-case words joined by hyphens' })
  .max(40, { error: 'At most 40 characters' });

/** The desk's rating scale is data: a desk chief edits the words, and may add a level. */
export interface RatingLevelView {
  id: string;
  /** Its number on the scale (the highest holds up best); null for a non-rating outcome. */
  number: number | null;
  label: string;
  description: string;
  /** False for outcomes that are not ratings, such as "not checkable". */
  isRating: boolean;
  /** Whether a verdict uses it: a level in use cannot be deleted. */
  inUse: boolean;
  version: number;
}

export const createRatingLevelSchema = z.object({
  id: ratingLevelIdSchema,
  number: z.number().int().min(1).max(20).nullable(),
  label: boundedText(60),
  description: boundedText(600),
  isRating: z.boolean(),
});
export type CreateRatingLevelRequest = z.infer<typeof createRatingLevelSchema>;

export const updateRatingLevelSchema = z.object({
  label: boundedText(60).optional(),
  description: boundedText(600).optional(),
  version: versionSchema,
});
export type UpdateRatingLevelRequest = z.infer<typeof updateRatingLevelSchema>;
