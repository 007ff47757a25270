import { createConsultationSchema, type CreateConsultationRequest } from '@skyledger/contracts';
import { z } from 'zod';
import { addIssuesAt } from './form-rules';

export const consultationFormSchema = z
  .object({
    name: z.string(),
    affiliation: z.string(),
    field: z.string(),
    quote: z.string(),
    consultedOn: z.string(),
    declaredConflicts: z.string(),
    independence: z.enum(['', 'yes', 'no']),
  })
  .superRefine((form, ctx) => {
    addIssuesAt(ctx, createConsultationSchema.safeParse(toRequest(form)), {
      rename: consultationFormField,
    });
  });
export type ConsultationForm = z.input<typeof consultationFormSchema>;

export const emptyConsultationForm: ConsultationForm = {
  name: '',
  affiliation: '',
  field: '',
  quote: '',
  consultedOn: '',
  declaredConflicts: '',
  independence: '',
};

export const consultationFormFields = [
  'name',
  'affiliation',
  'field',
  'quote',
  'consultedOn',
  'declaredConflicts',
  'independence',
] as const;

export function consultationFormField(apiField: string): string {
  return apiField === 'independentOfClaimant' ? 'independence' : apiField;
}

function toRequest(form: ConsultationForm) {
  return {
    name: form.name,
    affiliation: form.affiliation,
    field: form.field,
    quote: form.quote,
    consultedOn: form.consultedOn,
    declaredConflicts: form.declaredConflicts,
    independentOfClaimant: form.independence === '' ? undefined : form.independence === 'yes',
  };
}

export function toCreateConsultationRequest(form: ConsultationForm): CreateConsultationRequest {
  return createConsultationSchema.parse(toRequest(form));
}
