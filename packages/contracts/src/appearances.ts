import { z } from 'zod';
import {
  boundedText,
  instantSchema,
  timeZoneSchema,
  uuidSchema,
  versionSchema,
  webUrlSchema,
  type PersonRef,
} from './common.js';

const appearanceFields = {
  url: webUrlSchema,
  outlet: boundedText(160),
  /** When the claim was seen there, as an instant with its offset. */
  seenAt: instantSchema,
  /** The IANA zone the person saw it in, so the time reads as they saw it. */
  seenTimeZone: timeZoneSchema,
  isFirstKnown: z.boolean().optional(),
};

export const createAppearanceSchema = z.object(appearanceFields);
export type CreateAppearanceRequest = z.infer<typeof createAppearanceSchema>;

export const updateAppearanceSchema = z.object(appearanceFields).partial().extend({
  /** An attachment of the same claim holding the archived capture; null removes it. */
  captureAttachmentId: uuidSchema.nullable().optional(),
  version: versionSchema,
});
export type UpdateAppearanceRequest = z.infer<typeof updateAppearanceSchema>;

export interface AppearanceView {
  id: string;
  url: string;
  outlet: string;
  seenAt: string;
  seenTimeZone: string;
  isFirstKnown: boolean;
  captureAttachmentId: string | null;
  addedBy: PersonRef;
  createdAt: string;
  version: number;
}
