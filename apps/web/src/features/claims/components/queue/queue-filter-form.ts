import { dateSchema, topicSchema, type ClaimQueueQuery } from '@skyledger/contracts';
import { z } from 'zod';

const emptyOr = <T extends z.ZodType>(schema: T) => z.union([z.literal(''), schema]);

/** The queue's filter form: every field a string or a tick, checked by the API's own rules. */
export const queueFilterFormSchema = z
  .object({
    assignee: z.string(),
    mine: z.boolean(),
    topic: emptyOr(topicSchema),
    claimant: z.string(),
    filedFrom: emptyOr(dateSchema),
    filedTo: emptyOr(dateSchema),
    legal: z.enum(['any', 'yes', 'no']),
  })
  .refine((form) => !form.filedFrom || !form.filedTo || form.filedFrom <= form.filedTo, {
    error: 'The end of the range must not be before its start',
    path: ['filedTo'],
  });
export type QueueFilterForm = z.input<typeof queueFilterFormSchema>;

type FilterKey = 'assignee' | 'mine' | 'topic' | 'claimant' | 'filedFrom' | 'filedTo' | 'legal';
export type QueueFilters = Pick<ClaimQueueQuery, FilterKey>;

export function toFilterForm(query: ClaimQueueQuery): QueueFilterForm {
  return {
    assignee: query.assignee ?? 'any',
    mine: query.mine ?? false,
    topic: query.topic ?? '',
    claimant: query.claimant ?? '',
    filedFrom: query.filedFrom ?? '',
    filedTo: query.filedTo ?? '',
    legal: query.legal === undefined ? 'any' : query.legal ? 'yes' : 'no',
  };
}

/** Every filter key, set or left undefined, so applying the form replaces the old filters. */
export function toQueueFilters(form: z.output<typeof queueFilterFormSchema>): QueueFilters {
  return {
    assignee: form.assignee === 'any' ? undefined : form.assignee,
    mine: form.mine || undefined,
    topic: form.topic || undefined,
    claimant: form.claimant || undefined,
    filedFrom: form.filedFrom || undefined,
    filedTo: form.filedTo || undefined,
    legal: form.legal === 'any' ? undefined : form.legal === 'yes',
  };
}

export const noFilters: QueueFilters = toQueueFilters({
  assignee: 'any',
  mine: false,
  topic: '',
  claimant: '',
  filedFrom: '',
  filedTo: '',
  legal: 'any',
});
