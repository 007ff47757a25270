import { z } from 'zod';
import { boundedText, dateSchema, versionSchema, type PersonRef } from './common.js';

const consultationFields = {
  name: boundedText(160),
  affiliation: boundedText(200),
  field: boundedText(160),
  quote: boundedText(5000),
  consultedOn: dateSchema,
  /** What the expert declared; "None declared" is an answer, an empty field is not. */
  declaredConflicts: boundedText(1000),
  independentOfClaimant: z.boolean({ error: 'Say whether the expert is independent' }),
};

export const createConsultationSchema = z.object(consultationFields);
export type CreateConsultationRequest = z.infer<typeof createConsultationSchema>;

export const updateConsultationSchema = z
  .object(consultationFields)
  .partial()
  .extend({ version: versionSchema });
export type UpdateConsultationRequest = z.infer<typeof updateConsultationSchema>;

export interface ConsultationView {
  id: string;
  name: string;
  affiliation: string;
  field: string;
  quote: string;
  consultedOn: string;
  declaredConflicts: string;
  independentOfClaimant: boolean;
  loggedBy: PersonRef;
  createdAt: string;
  version: number;
}
