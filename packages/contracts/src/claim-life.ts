import { z } from 'zod';

/** The claim life from PRODUCT.md, in order. */
export const claimStatuses = [
  'filed',
  'in_research',
  'awaiting_signoff',
  'sent_back',
  'cleared',
  'published',
  'set_aside',
] as const;
export type ClaimStatus = (typeof claimStatuses)[number];
export const claimStatusSchema = z.enum(claimStatuses);

export const claimStatusLabels: Record<ClaimStatus, string> = {
  filed: 'Filed',
  in_research: 'In research',
  awaiting_signoff: 'Awaiting sign-off',
  sent_back: 'Sent back',
  cleared: 'Cleared',
  published: 'Published',
  set_aside: 'Set aside',
};

/** Statuses a claim can still be set aside from (everything not yet out of the desk's hands). */
export const openClaimStatuses = [
  'filed',
  'in_research',
  'awaiting_signoff',
  'sent_back',
  'cleared',
] as const satisfies readonly ClaimStatus[];

export const setAsideReasons = ['duplicate', 'not_checkable', 'out_of_scope'] as const;
export type SetAsideReason = (typeof setAsideReasons)[number];
export const setAsideReasonLabels: Record<SetAsideReason, string> = {
  duplicate: 'Duplicate of an earlier claim',
  not_checkable: 'Not checkable',
  out_of_scope: 'Out of scope',
};
