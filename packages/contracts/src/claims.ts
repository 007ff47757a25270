import { z } from 'zod';
import { type AppearanceView, createAppearanceSchema } from './appearances.js';
import { type AttachmentView } from './attachments.js';
import {
  claimStatusSchema,
  setAsideReasons,
  type ClaimStatus,
  type SetAsideReason,
} from './claim-life.js';
import { createClaimantSchema, type ClaimantView } from './claimants.js';
import { type CommentView } from './comments.js';
import {
  boundedText,
  dateSchema,
  uuidSchema,
  versionSchema,
  type Page,
  type PersonRef,
} from './common.js';
import { type ConsultationView } from './consultations.js';
import { type ReplyAttemptView } from './reply-attempts.js';
import { type ClaimSourceView } from './sources.js';

export const CLAIM_TEXT_MAX_LENGTH = 4000;
/** A neutral one-line summary: it must fit a queue row and a share card. */
export const CLAIM_SUMMARY_MAX_LENGTH = 75;
export const TOPIC_MAX_LENGTH = 40;
export const TOPICS_MAX = 8;

/** A topic tag: lower-case words joined by hyphens, e.g. `sea-level`, `solar`. */
export const topicSchema = z
  .string()
  .trim()
  .toLowerCase()
  .regex(/^[a-z0-9]+(?:-[a-z0-9]+)*$/, {
    error: 'Use lower-case letters, digits and hyphens, e.g. sea-level',
  })
  .max(TOPIC_MAX_LENGTH, { error: `At most ${TOPIC_MAX_LENGTH} characters` });

export const topicsSchema = z
  .array(topicSchema)
  .max(TOPICS_MAX, { error: `At most ${TOPICS_MAX} topics` })
  .refine((topics) => new Set(topics).size === topics.length, { error: 'A topic is repeated' });

const claimFields = {
  text: boundedText(CLAIM_TEXT_MAX_LENGTH),
  summary: boundedText(CLAIM_SUMMARY_MAX_LENGTH),
  topics: topicsSchema,
  legalReview: z.boolean().optional(),
};

/** File a claim: who made it (an existing claimant or a new one) and where it was first seen. */
export const createClaimSchema = z
  .object({
    ...claimFields,
    claimantId: uuidSchema.optional(),
    claimant: createClaimantSchema.optional(),
    firstAppearance: createAppearanceSchema.optional(),
  })
  .refine((claim) => Boolean(claim.claimantId) !== Boolean(claim.claimant), {
    error: 'Pick a claimant or describe a new one (one of the two)',
    path: ['claimantId'],
  });
export type CreateClaimRequest = z.infer<typeof createClaimSchema>;

export const updateClaimSchema = z
  .object({ ...claimFields, claimantId: uuidSchema })
  .partial()
  .extend({ version: versionSchema });
export type UpdateClaimRequest = z.infer<typeof updateClaimSchema>;

/** Give a claim to someone (null takes it off them); a science editor may only take it. */
export const assignClaimSchema = z.object({
  assigneeId: uuidSchema.nullable(),
  version: versionSchema,
});
export type AssignClaimRequest = z.infer<typeof assignClaimSchema>;

/** A move along the claim life. Issue 7 adds the sign-off moves to this same request. */
export const claimTransitionSchema = z.object({
  to: claimStatusSchema,
  reason: z.enum(setAsideReasons).optional(),
  note: boundedText(2000, { required: false }).optional(),
  version: versionSchema,
});
export type ClaimTransitionRequest = z.infer<typeof claimTransitionSchema>;

export const claimSortFields = ['filedAt', 'updatedAt', 'status', 'summary'] as const;
export type ClaimSortField = (typeof claimSortFields)[number];
export const CLAIM_PAGE_SIZE_DEFAULT = 25;
export const CLAIM_PAGE_SIZE_MAX = 100;

/**
 * The queue's filters, as query parameters (also the desk's URL search parameters).
 * `mine` means assigned to me, or, for a reporter, filed by me. `assignee=none` finds
 * claims nobody has taken.
 */
export const claimQueueQuerySchema = z.object({
  status: claimStatusSchema.optional(),
  assignee: z.union([uuidSchema, z.literal('none')]).optional(),
  mine: z.stringbool().optional(),
  topic: topicSchema.optional(),
  claimant: uuidSchema.optional(),
  filedFrom: dateSchema.optional(),
  filedTo: dateSchema.optional(),
  legal: z.stringbool().optional(),
  sort: z.enum(claimSortFields).optional(),
  order: z.enum(['asc', 'desc']).optional(),
  page: z.coerce.number().int().min(1).optional(),
  pageSize: z.coerce.number().int().min(1).max(CLAIM_PAGE_SIZE_MAX).optional(),
});
export type ClaimQueueQuery = z.infer<typeof claimQueueQuerySchema>;

export interface ClaimListItem {
  id: string;
  summary: string;
  status: ClaimStatus;
  topics: string[];
  legalReview: boolean;
  claimant: { id: string; name: string; kind: ClaimantView['kind'] };
  assignee: PersonRef | null;
  filedBy: PersonRef;
  filedAt: string;
  updatedAt: string;
}

export interface ClaimQueueResponse extends Page<ClaimListItem> {
  /** Claims per status under the same filters, status aside: the queue's tabs. */
  counts: Record<ClaimStatus, number>;
}

export interface ClaimDetail extends Omit<ClaimListItem, 'claimant'> {
  text: string;
  claimant: ClaimantView;
  setAsideReason: SetAsideReason | null;
  setAsideNote: string | null;
  appearances: AppearanceView[];
  sources: ClaimSourceView[];
  attachments: AttachmentView[];
  replyAttempts: ReplyAttemptView[];
  consultations: ConsultationView[];
  comments: CommentView[];
  version: number;
}

/** One audit event in a claim's history. */
export interface ClaimHistoryEvent {
  id: string;
  action: string;
  entityType: string;
  entityId: string;
  actor: PersonRef | null;
  summary: Record<string, unknown>;
  at: string;
}
