import {
  publishClaimSchema,
  timeZoneSchema,
  updateNoteKinds,
  type PublishClaimRequest,
} from '@skyledger/contracts';
import { z } from 'zod';
import { addIssuesAt, localDateTimeSchema } from '@/features/claims/forms/form-rules';
import { zonedInstant } from '@/lib/zoned-time';

/** The API refuses a time less than a minute ahead (apps/api publishing.service.ts). */
const MIN_LEAD_MS = 60_000;

export interface PublishFormOptions {
  /** At a chosen time (an embargo) rather than now. */
  scheduled: boolean;
  /** Published before: this publication goes out with an update note. */
  needsNote: boolean;
}

const noteSchema = publishClaimSchema.shape.note.unwrap();

/**
 * Publishing as typed: the time on a clock and that clock's zone for a schedule, and the
 * update note when the explainer was published before. Each rule is the contract's.
 */
export function publishFormSchema({ scheduled, needsNote }: PublishFormOptions) {
  return z
    .object({
      atLocal: z.string(),
      timeZone: z.string(),
      noteKind: z.enum([...updateNoteKinds, '']),
      noteText: z.string(),
    })
    .superRefine((form, ctx) => {
      if (scheduled) {
        const local = localDateTimeSchema.safeParse(form.atLocal);
        const zone = timeZoneSchema.safeParse(form.timeZone);
        addIssuesAt(ctx, local, { prefix: ['atLocal'] });
        addIssuesAt(ctx, zone, { prefix: ['timeZone'] });
        if (
          local.success &&
          zone.success &&
          Date.parse(zonedInstant(form.atLocal, form.timeZone)) < Date.now() + MIN_LEAD_MS
        ) {
          ctx.addIssue({
            code: 'custom',
            message: 'Choose a time at least a minute from now',
            path: ['atLocal'],
          });
        }
      }
      if (needsNote) {
        if (!form.noteKind) {
          ctx.addIssue({
            code: 'custom',
            message: 'Choose what kind of change this is',
            path: ['noteKind'],
          });
        }
        if (!form.noteText.trim()) {
          ctx.addIssue({
            code: 'custom',
            message: 'Say what changed: readers see this note on the page',
            path: ['noteText'],
          });
        } else {
          addIssuesAt(ctx, noteSchema.shape.text.safeParse(form.noteText), {
            prefix: ['noteText'],
          });
        }
      }
    });
}
export type PublishForm = z.input<ReturnType<typeof publishFormSchema>>;

export function emptyPublishForm(timeZone: string): PublishForm {
  return { atLocal: '', timeZone, noteKind: '', noteText: '' };
}

/** The fields the form shows, where the API's field errors can go; others go above them. */
export function publishFormFields({ scheduled, needsNote }: PublishFormOptions) {
  return [
    ...(scheduled ? (['atLocal', 'timeZone'] as const) : []),
    ...(needsNote ? (['noteKind', 'noteText'] as const) : []),
  ];
}

/** Where the API's field names show on this form. */
export function publishFormField(apiField: string): string {
  if (apiField === 'at') return 'atLocal';
  if (apiField === 'note' || apiField === 'note.text') return 'noteText';
  if (apiField === 'note.kind') return 'noteKind';
  return apiField;
}

export function toPublishRequest(
  form: PublishForm,
  { scheduled, needsNote }: PublishFormOptions,
  version: number,
): PublishClaimRequest {
  return publishClaimSchema.parse({
    ...(scheduled
      ? { at: zonedInstant(form.atLocal, form.timeZone), timeZone: form.timeZone }
      : {}),
    ...(needsNote ? { note: { kind: form.noteKind, text: form.noteText } } : {}),
    version,
  });
}
