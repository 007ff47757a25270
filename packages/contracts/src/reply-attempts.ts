import { z } from 'zod';
import { boundedText, instantSchema, versionSchema, type PersonRef } from './common.js';

export const replyChannels = [
  'email',
  'phone',
  'letter',
  'social_message',
  'in_person',
  'spokesperson',
  'other',
] as const;
export type ReplyChannel = (typeof replyChannels)[number];
export const replyChannelLabels: Record<ReplyChannel, string> = {
  email: 'E-mail',
  phone: 'Phone',
  letter: 'Letter',
  social_message: 'Social media message',
  in_person: 'In person',
  spokesperson: 'Through a spokesperson',
  other: 'Other',
};

export const replyOutcomes = ['awaiting', 'replied', 'declined', 'no_reply'] as const;
export type ReplyOutcome = (typeof replyOutcomes)[number];
export const replyOutcomeLabels: Record<ReplyOutcome, string> = {
  awaiting: 'Awaiting a reply',
  replied: 'Replied',
  declined: 'Declined to comment',
  no_reply: 'No reply by the deadline',
};

const replyAttemptFields = {
  contacted: boundedText(200),
  contactedAt: instantSchema,
  channel: z.enum(replyChannels, { error: 'Choose how they were contacted' }),
  deadline: instantSchema.optional(),
  outcome: z.enum(replyOutcomes, { error: 'Choose the outcome' }),
  /** Their reply in their words, or a summary of it; required when they replied. */
  reply: boundedText(5000, { required: false }).optional(),
};

const replyNeedsText = (attempt: { outcome?: ReplyOutcome; reply?: string }) =>
  attempt.outcome !== 'replied' || Boolean(attempt.reply);

export const createReplyAttemptSchema = z
  .object(replyAttemptFields)
  .refine(replyNeedsText, { error: 'Give the reply when they replied', path: ['reply'] });
export type CreateReplyAttemptRequest = z.infer<typeof createReplyAttemptSchema>;

export const updateReplyAttemptSchema = z
  .object(replyAttemptFields)
  .partial()
  .extend({ version: versionSchema });
export type UpdateReplyAttemptRequest = z.infer<typeof updateReplyAttemptSchema>;

export interface ReplyAttemptView {
  id: string;
  contacted: string;
  contactedAt: string;
  channel: ReplyChannel;
  deadline: string | null;
  outcome: ReplyOutcome;
  reply: string | null;
  loggedBy: PersonRef;
  createdAt: string;
  version: number;
}
