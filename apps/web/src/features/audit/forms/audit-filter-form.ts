import { auditQuerySchema, type AuditQuery } from '@skyledger/contracts';
import { z } from 'zod';

const emptyOr = <T extends z.ZodType>(schema: T) => z.union([z.literal(''), schema]);
const { action, entityType, actor, claim, from, to } = auditQuerySchema.shape;

/** The audit trail's filter form: every field a string, checked by the API's own rules. */
export const auditFilterFormSchema = z
  .object({
    action: action.unwrap(),
    entityType: entityType.unwrap(),
    actor: z.union([z.literal('any'), actor.unwrap()]),
    claim: z.string().trim().pipe(emptyOr(claim.unwrap())),
    from: emptyOr(from.unwrap()),
    to: emptyOr(to.unwrap()),
  })
  .refine((form) => !form.from || !form.to || form.from <= form.to, {
    error: 'The end of the range must not be before its start',
    path: ['to'],
  });
export type AuditFilterForm = z.input<typeof auditFilterFormSchema>;

export type AuditFilters = Omit<AuditQuery, 'page'>;

export function toAuditFilterForm(query: AuditQuery): AuditFilterForm {
  return {
    action: query.action ?? '',
    entityType: query.entityType ?? '',
    actor: query.actor ?? 'any',
    claim: query.claim ?? '',
    from: query.from ?? '',
    to: query.to ?? '',
  };
}

/** The filters the form sets; empty fields filter nothing. Any change goes back to page 1. */
export function toAuditFilters(form: z.output<typeof auditFilterFormSchema>): AuditFilters {
  return {
    action: form.action || undefined,
    entityType: form.entityType || undefined,
    actor: form.actor === 'any' ? undefined : form.actor,
    claim: form.claim || undefined,
    from: form.from || undefined,
    to: form.to || undefined,
  };
}
