import { z } from 'zod';
import { boundedText, dateSchema, webUrlSchema, type PersonRef } from './common.js';

export const sourceKinds = [
  'peer_reviewed_paper',
  'preprint',
  'assessment_report',
  'agency_dataset',
  'agency_statement',
  'press_release',
  'news_report',
  'blog_or_social_post',
  'expert_interview',
] as const;
export type SourceKind = (typeof sourceKinds)[number];
export const sourceKindLabels: Record<SourceKind, string> = {
  peer_reviewed_paper: 'Peer-reviewed paper',
  preprint: 'Preprint',
  assessment_report: 'Assessment report',
  agency_dataset: 'Agency dataset',
  agency_statement: 'Agency statement',
  press_release: 'Press release',
  news_report: 'News report',
  blog_or_social_post: 'Blog or social post',
  expert_interview: 'Expert interview',
};

/** How far the desk trusts a source for what it is cited for; the reason is always given. */
export const reliabilityGrades = ['strong', 'adequate', 'weak', 'unreliable'] as const;
export type ReliabilityGrade = (typeof reliabilityGrades)[number];
export const reliabilityGradeLabels: Record<ReliabilityGrade, string> = {
  strong: 'Strong',
  adequate: 'Adequate',
  weak: 'Weak',
  unreliable: 'Unreliable',
};
export const reliabilityGradeDescriptions: Record<ReliabilityGrade, string> = {
  strong: 'Primary, reviewed or official evidence that directly supports what it is cited for',
  adequate: 'Credible and relevant, with limits the explainer should mention',
  weak: 'Indirect, unreviewed or partial; never enough on its own',
  unreliable: 'Known errors, undisclosed interests or no traceable evidence; cite only to rebut',
};

/** A DOI as `10.<registrant>/<suffix>`, without the resolver prefix. */
export const doiSchema = z
  .string()
  .trim()
  .max(200, { error: 'At most 200 characters' })
  .regex(/^10\.\d{4,9}\/\S+$/, { error: 'Enter a DOI such as 10.1029/98GL01908' });

const sourceFields = {
  title: boundedText(300),
  authors: boundedText(500, { required: false }).optional(),
  publisher: boundedText(200, { required: false }).optional(),
  year: z
    .number()
    .int({ error: 'Enter a whole year' })
    .min(1600, { error: 'Enter a year from 1600' })
    .max(2100, { error: 'Enter a year up to 2100' })
    .optional(),
  doi: doiSchema.optional(),
  url: webUrlSchema.optional(),
  accessedOn: dateSchema.optional(),
  kind: z.enum(sourceKinds, { error: 'Choose the kind of source' }),
  grade: z.enum(reliabilityGrades, { error: 'Choose a reliability grade' }),
  gradeReason: boundedText(1000),
};

export const createSourceSchema = z
  .object(sourceFields)
  .refine((source) => source.kind === 'expert_interview' || source.doi || source.url, {
    error: 'Give a DOI or a web address so others can find the source',
    path: ['url'],
  });
export type CreateSourceRequest = z.infer<typeof createSourceSchema>;

/** Attach a source to a claim: an existing one by id, or a new one. */
export const linkSourceSchema = z.union([
  z.object({ sourceId: z.uuid({ error: 'Must be a UUID' }) }),
  z.object({ source: createSourceSchema }),
]);
export type LinkSourceRequest = z.infer<typeof linkSourceSchema>;

export const updateSourceSchema = z
  .object(sourceFields)
  .partial()
  .extend({
    version: z.number().int().min(1),
  });
export type UpdateSourceRequest = z.infer<typeof updateSourceSchema>;

export interface SourceView {
  id: string;
  title: string;
  authors: string | null;
  publisher: string | null;
  year: number | null;
  doi: string | null;
  url: string | null;
  accessedOn: string | null;
  kind: SourceKind;
  grade: ReliabilityGrade;
  gradeReason: string;
  addedBy: PersonRef;
  createdAt: string;
  version: number;
}

/** A source as a claim lists it: who linked it there and when. */
export interface ClaimSourceView extends SourceView {
  linkedBy: PersonRef;
  linkedAt: string;
}
