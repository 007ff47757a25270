import type { ClaimDetail, UpdateClaimRequest } from '@skyledger/contracts';
import { z } from 'zod';
import { claimWordsSchema } from './file-claim-form';
import { addIssuesAt } from './form-rules';

export const editClaimFormSchema = z
  .object({ text: z.string(), summary: z.string(), topics: z.string(), legalReview: z.boolean() })
  .superRefine((form, ctx) => addIssuesAt(ctx, claimWordsSchema.safeParse(form)));
export type EditClaimForm = z.input<typeof editClaimFormSchema>;
export const editClaimFormFields = ['text', 'summary', 'topics', 'legalReview'] as const;

export function toEditClaimForm(claim: ClaimDetail): EditClaimForm {
  return {
    text: claim.text,
    summary: claim.summary,
    topics: claim.topics.join(', '),
    legalReview: claim.legalReview,
  };
}

/** The edit with the version the editor last saw: a stale one gets 409 and overwrites nothing. */
export function toUpdateClaimRequest(values: EditClaimForm, version: number): UpdateClaimRequest {
  return { ...claimWordsSchema.parse(values), legalReview: values.legalReview, version };
}
