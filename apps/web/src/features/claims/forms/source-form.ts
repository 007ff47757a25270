import {
  createSourceSchema,
  reliabilityGrades,
  sourceKinds,
  type CreateSourceRequest,
} from '@skyledger/contracts';
import { z } from 'zod';
import { addIssuesAt, optionalText } from './form-rules';

/** A new source as typed: every field a string until the request is made. */
export const sourceFormSchema = z
  .object({
    title: z.string(),
    authors: z.string(),
    publisher: z.string(),
    year: z.string(),
    doi: z.string(),
    url: z.string(),
    accessedOn: z.string(),
    kind: z.enum([...sourceKinds, '']),
    grade: z.enum([...reliabilityGrades, '']),
    gradeReason: z.string(),
  })
  .superRefine((form, ctx) => {
    if (form.year.trim() && !/^\d{1,4}$/.test(form.year.trim())) {
      ctx.addIssue({ code: 'custom', path: ['year'], message: 'Enter a year such as 2021' });
      return;
    }
    addIssuesAt(ctx, createSourceSchema.safeParse(toSourceRequest(form)));
  });
export type SourceForm = z.input<typeof sourceFormSchema>;

export const emptySourceForm: SourceForm = {
  title: '',
  authors: '',
  publisher: '',
  year: '',
  doi: '',
  url: '',
  accessedOn: '',
  kind: '',
  grade: '',
  gradeReason: '',
};

export const sourceFormFields = [
  'title',
  'authors',
  'publisher',
  'year',
  'doi',
  'url',
  'accessedOn',
  'kind',
  'grade',
  'gradeReason',
] as const;

function toSourceRequest(form: SourceForm) {
  const year = optionalText(form.year);
  return {
    title: form.title,
    authors: optionalText(form.authors),
    publisher: optionalText(form.publisher),
    year: year === undefined ? undefined : Number(year),
    doi: optionalText(form.doi),
    url: optionalText(form.url),
    accessedOn: optionalText(form.accessedOn),
    kind: form.kind || undefined,
    grade: form.grade || undefined,
    gradeReason: form.gradeReason,
  };
}

/** The request body; call only with values the form schema passed. */
export function toCreateSourceRequest(form: SourceForm): CreateSourceRequest {
  return createSourceSchema.parse(toSourceRequest(form));
}
