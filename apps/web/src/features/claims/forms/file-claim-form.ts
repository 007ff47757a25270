import {
  claimantKinds,
  createClaimantSchema,
  createClaimSchema,
  topicsSchema,
  type ClaimantView,
  type CreateClaimRequest,
} from '@skyledger/contracts';
import { z } from 'zod';
import {
  appearanceFormField,
  appearanceFormSchema,
  emptyAppearance,
  isAppearanceBlank,
  toAppearanceRequest,
} from './appearance-form';
import { looksLikeEvidenceFile } from './evidence-file';
import { addIssuesAt, optionalText } from './form-rules';

/** "sea-level, Solar" → ["sea-level", "solar"]: commas or spaces between topic tags. */
export function splitTopics(typed: string): string[] {
  return typed
    .split(/[\s,]+/)
    .map((topic) => topic.trim())
    .filter(Boolean);
}

/** The claim's own words and tags, as the claim form and the edit form type them. */
export const claimWordsSchema = z.object({
  text: createClaimSchema.shape.text,
  summary: createClaimSchema.shape.summary,
  topics: z.string().transform(splitTopics).pipe(topicsSchema),
});

const newClaimantFields = z.object({
  name: z.string(),
  kind: z.enum([...claimantKinds, '']),
  affiliation: z.string(),
  notes: z.string(),
});

export const fileClaimFormSchema = z
  .object({
    text: z.string(),
    summary: z.string(),
    topics: z.string(),
    claimantMode: z.enum(['existing', 'new']),
    picked: z.custom<ClaimantView>().nullable(),
    newClaimant: newClaimantFields,
    // Checked as a whole below, and only when any of it is given: it is optional.
    appearance: z.object({
      url: z.string(),
      outlet: z.string(),
      seenAtLocal: z.string(),
      seenTimeZone: z.string(),
    }),
    legalReview: z.boolean(),
    capture: z.custom<File>().nullable(),
  })
  // Every rule is checked here, on plain strings, so all the broken ones show at once.
  .superRefine((form, ctx) => {
    addIssuesAt(ctx, claimWordsSchema.safeParse(form));
    if (form.claimantMode === 'existing' && !form.picked) {
      ctx.addIssue({
        code: 'custom',
        path: ['picked'],
        message: 'Choose who made the claim, or describe someone new',
      });
    }
    if (form.claimantMode === 'new') {
      addIssuesAt(ctx, createClaimantSchema.safeParse(toNewClaimant(form)), {
        prefix: ['newClaimant'],
      });
    }
    const blank = isAppearanceBlank(form.appearance);
    if (!blank) {
      addIssuesAt(ctx, appearanceFormSchema.safeParse(form.appearance), { prefix: ['appearance'] });
    }
    if (form.capture && blank) {
      ctx.addIssue({
        code: 'custom',
        path: ['capture'],
        message: 'A capture belongs to an appearance: say where the claim was seen',
      });
    } else if (form.capture && !looksLikeEvidenceFile(form.capture)) {
      ctx.addIssue({
        code: 'custom',
        path: ['capture'],
        message: 'Choose a PDF, PNG, JPEG, WebP, CSV or plain-text file',
      });
    }
  });
export type FileClaimForm = z.input<typeof fileClaimFormSchema>;
export type FileClaimValues = z.output<typeof fileClaimFormSchema>;

export function emptyFileClaimForm(timeZone: string): FileClaimForm {
  return {
    text: '',
    summary: '',
    topics: '',
    claimantMode: 'existing',
    picked: null,
    newClaimant: { name: '', kind: '', affiliation: '', notes: '' },
    appearance: emptyAppearance(timeZone),
    legalReview: false,
    capture: null,
  };
}

function toNewClaimant({ newClaimant }: Pick<FileClaimValues, 'newClaimant'>) {
  return {
    name: newClaimant.name,
    kind: newClaimant.kind || undefined,
    affiliation: optionalText(newClaimant.affiliation),
    notes: optionalText(newClaimant.notes),
  };
}

/** The request body; call only with values the form schema passed. */
export function toCreateClaimRequest(values: FileClaimValues): CreateClaimRequest {
  const body: CreateClaimRequest = {
    ...claimWordsSchema.parse(values),
    legalReview: values.legalReview,
  };
  if (values.claimantMode === 'existing' && values.picked) body.claimantId = values.picked.id;
  else body.claimant = createClaimantSchema.parse(toNewClaimant(values));
  if (!isAppearanceBlank(values.appearance)) {
    body.firstAppearance = toAppearanceRequest(appearanceFormSchema.parse(values.appearance));
  }
  return body;
}

export const fileClaimFormFields = [
  'text',
  'summary',
  'topics',
  'picked',
  'newClaimant.name',
  'newClaimant.kind',
  'newClaimant.affiliation',
  'newClaimant.notes',
  'appearance.url',
  'appearance.outlet',
  'appearance.seenAtLocal',
  'appearance.seenTimeZone',
  'legalReview',
  'capture',
] as const;

/** Where the API's field names (`firstAppearance.seenAt`, `topics.2`, ...) show on this form. */
export function fileClaimFormField(apiField: string): string {
  const [head, ...rest] = apiField.split('.');
  const tail = rest.join('.');
  if (head === 'topics') return 'topics';
  if (head === 'claimantId') return 'picked';
  if (head === 'claimant') return `newClaimant.${tail}`;
  if (head === 'firstAppearance') return appearanceFormField(tail, 'appearance');
  return apiField;
}
