import { z } from 'zod';
import { boundedText, uuidSchema, versionSchema, type PersonRef } from './common.js';
import { ratingLevelIdSchema } from './rating-scale.js';

export const BOTTOM_LINE_MAX_LENGTH = 1200;

/**
 * Where a verdict version stands: drafted and edited, frozen when submitted, then sent
 * back or cleared by the copy desk; published (with the publishing issue); superseded
 * when a later version takes its place.
 */
export const verdictVersionStates = [
  'draft',
  'submitted',
  'sent_back',
  'cleared',
  'published',
  'superseded',
] as const;
export type VerdictVersionState = (typeof verdictVersionStates)[number];

/** The explainer's Tiptap document: checked and cleaned on the server. */
export const explainerBodySchema = z.object({ type: z.literal('doc') }).loose();

const verdictFields = {
  ratingId: ratingLevelIdSchema.nullable(),
  bottomLine: boundedText(BOTTOM_LINE_MAX_LENGTH, { required: false }),
  body: explainerBodySchema,
  /** The source that backs the central finding: one of the claim's sources. */
  primarySourceId: uuidSchema.nullable(),
};

/** Start a new draft; what is left out comes from the latest version, or the template. */
export const createVerdictVersionSchema = z.object(verdictFields).partial();
export type CreateVerdictVersionRequest = z.infer<typeof createVerdictVersionSchema>;

export const updateVerdictVersionSchema = z
  .object(verdictFields)
  .partial()
  .extend({ version: versionSchema });
export type UpdateVerdictVersionRequest = z.infer<typeof updateVerdictVersionSchema>;

export const signoffDecisions = ['cleared', 'sent_back'] as const;
export type SignoffDecision = (typeof signoffDecisions)[number];

export const checklistItemKeys = [
  'verdictComplete',
  'primarySource',
  'rightOfReply',
  'workingsRecomputed',
  'legalReview',
] as const;
export type ChecklistItemKey = (typeof checklistItemKeys)[number];

export interface ChecklistItem {
  key: ChecklistItemKey;
  label: string;
  done: boolean;
  /** What makes it done, or what is still open, in words. */
  detail: string;
}

export const checklistItemLabels: Record<ChecklistItemKey, string> = {
  verdictComplete: 'Rating, bottom line and explainer written',
  primarySource: 'A primary source for the central finding',
  rightOfReply: 'Right of reply logged or waived',
  workingsRecomputed: 'Every working recomputed by the server',
  legalReview: 'Legal-review flag cleared',
};

/** One item of the sign-off checklist, under its label. */
export const checklistItem = (
  key: ChecklistItemKey,
  done: boolean,
  detail: string,
): ChecklistItem => ({ key, label: checklistItemLabels[key], done, detail });

/** The legal-review item, for a claim flagged or not. */
export const legalReviewItem = (flagged: boolean): ChecklistItem =>
  checklistItem(
    'legalReview',
    !flagged,
    flagged
      ? 'Flagged for legal review: a desk chief clears the flag once the newsroom’s counsel has seen it'
      : 'Not flagged',
  );

export interface SignoffDecisionView {
  id: string;
  versionId: string;
  decision: SignoffDecision;
  notes: string | null;
  by: PersonRef;
  at: string;
  /** The checklist as it stood when the decision was taken. */
  checklist: ChecklistItem[];
}

export interface VerdictVersionView {
  id: string;
  number: number;
  state: VerdictVersionState;
  ratingId: string | null;
  bottomLine: string;
  body: { type: 'doc'; [key: string]: unknown };
  /** The body rendered on the server and sanitized; citations numbered. */
  bodyHtml: string;
  primarySourceId: string | null;
  citedSourceIds: string[];
  embeddedWorkingIds: string[];
  draftedBy: PersonRef;
  lastEditedBy: PersonRef;
  createdAt: string;
  updatedAt: string;
  submittedAt: string | null;
  /** The claim as the copy desk cleared it with this version (readers' copy); null until cleared. */
  claimAsCleared: ClaimAsCleared | null;
  decisions: SignoffDecisionView[];
  version: number;
}

/** What readers are shown of the claim with a version: its words, summary and who said it. */
export interface ClaimAsCleared {
  text: string;
  summary: string;
  claimantName: string;
}

/** A save that lost to another's: kept so its text can be recovered. */
export interface VerdictConflictView {
  id: string;
  versionId: string;
  savedBy: PersonRef;
  at: string;
  ratingId: string | null;
  bottomLine: string | null;
  body: { type: 'doc'; [key: string]: unknown } | null;
}

export interface ClaimVerdictView {
  /** Newest first. */
  versions: VerdictVersionView[];
  conflicts: VerdictConflictView[];
}

export interface SignoffView {
  /** The version awaiting a decision, or null. */
  version: VerdictVersionView | null;
  /** The version before it, to compare with. */
  previous: VerdictVersionView | null;
  checklist: ChecklistItem[];
  /** Whether the person asking may clear or send back this version, and why not. */
  mayDecide: boolean;
  whyNot: string | null;
}

export const replyWaiverSchema = z.object({
  reason: boundedText(1000),
  version: versionSchema,
});
export type ReplyWaiverRequest = z.infer<typeof replyWaiverSchema>;
