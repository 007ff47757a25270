import {
  createAppearanceSchema,
  timeZoneSchema,
  type CreateAppearanceRequest,
} from '@skyledger/contracts';
import { z } from 'zod';
import { zonedInstant } from '@/lib/zoned-time';
import { localDateTimeSchema } from './form-rules';

/** Where a claim was seen, as typed: the time on the clock and the zone of that clock. */
export const appearanceFormSchema = z.object({
  url: createAppearanceSchema.shape.url,
  outlet: createAppearanceSchema.shape.outlet,
  seenAtLocal: localDateTimeSchema,
  seenTimeZone: timeZoneSchema,
});
export type AppearanceFormValues = z.input<typeof appearanceFormSchema>;

export function emptyAppearance(timeZone: string): AppearanceFormValues {
  return { url: '', outlet: '', seenAtLocal: '', seenTimeZone: timeZone };
}

export function isAppearanceBlank(values: AppearanceFormValues): boolean {
  return !values.url.trim() && !values.outlet.trim() && !values.seenAtLocal;
}

export function toAppearanceRequest(
  values: z.output<typeof appearanceFormSchema>,
): CreateAppearanceRequest {
  return {
    url: values.url,
    outlet: values.outlet,
    seenAt: zonedInstant(values.seenAtLocal, values.seenTimeZone),
    seenTimeZone: values.seenTimeZone,
  };
}

/** Where the API's names for appearance fields show on a form that nests them under `prefix`. */
export function appearanceFormField(apiField: string, prefix: string): string {
  const field = apiField === 'seenAt' ? 'seenAtLocal' : apiField;
  return `${prefix}.${field}`;
}
