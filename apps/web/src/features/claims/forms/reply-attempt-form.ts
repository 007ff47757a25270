import {
  createReplyAttemptSchema,
  replyChannels,
  replyOutcomes,
  timeZoneSchema,
  type CreateReplyAttemptRequest,
} from '@skyledger/contracts';
import { z } from 'zod';
import { zonedInstant } from '@/lib/zoned-time';
import { addIssuesAt, localDateTimeSchema, optionalText } from './form-rules';

const standInTime = '2000-01-01T00:00';

const localTimesSchema = z.object({
  contactedAtLocal: localDateTimeSchema,
  deadlineLocal: z.union([z.literal(''), localDateTimeSchema]),
  timeZone: timeZoneSchema,
});

/** One attempt to reach the claimant; both times are read on the clock of one zone. */
export const replyAttemptFormSchema = z
  .object({
    contacted: z.string(),
    contactedAtLocal: z.string(),
    timeZone: z.string(),
    channel: z.enum([...replyChannels, '']),
    deadlineLocal: z.string(),
    outcome: z.enum([...replyOutcomes, '']),
    reply: z.string(),
  })
  .superRefine((form, ctx) => {
    const times = localTimesSchema.safeParse(form);
    addIssuesAt(ctx, times);
    // With a time not yet whole, the other fields are still checked, against a stand-in time.
    const request = times.success
      ? toRequest(form)
      : toRequest({ ...form, contactedAtLocal: standInTime, deadlineLocal: '', timeZone: 'UTC' });
    addIssuesAt(ctx, createReplyAttemptSchema.safeParse(request), {
      rename: replyAttemptFormField,
    });
  });
export type ReplyAttemptForm = z.input<typeof replyAttemptFormSchema>;

export function emptyReplyAttemptForm(timeZone: string): ReplyAttemptForm {
  return {
    contacted: '',
    contactedAtLocal: '',
    timeZone,
    channel: '',
    deadlineLocal: '',
    outcome: '',
    reply: '',
  };
}

export const replyAttemptFormFields = [
  'contacted',
  'contactedAtLocal',
  'timeZone',
  'channel',
  'deadlineLocal',
  'outcome',
  'reply',
] as const;

/** Where the API's field names show on this form. */
export function replyAttemptFormField(apiField: string): string {
  if (apiField === 'contactedAt') return 'contactedAtLocal';
  if (apiField === 'deadline') return 'deadlineLocal';
  return apiField;
}

function toRequest(form: ReplyAttemptForm) {
  return {
    contacted: form.contacted,
    contactedAt: zonedInstant(form.contactedAtLocal, form.timeZone),
    channel: form.channel || undefined,
    deadline: form.deadlineLocal ? zonedInstant(form.deadlineLocal, form.timeZone) : undefined,
    outcome: form.outcome || undefined,
    reply: optionalText(form.reply),
  };
}

export function toCreateReplyAttemptRequest(form: ReplyAttemptForm): CreateReplyAttemptRequest {
  return createReplyAttemptSchema.parse(toRequest(form));
}
