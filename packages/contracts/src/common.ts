import { z } from 'zod';

export const uuidSchema = z.uuid({ error: 'Must be a UUID' });

/** An http(s) address; other schemes (javascript:, data:, file:) are refused. */
export const webUrlSchema = z
  .url({ protocol: /^https?$/, error: 'Enter a web address starting with http:// or https://' })
  .max(2048, { error: 'At most 2048 characters' });

/** An instant with its offset, e.g. `2026-11-30T18:05:00+01:00` or `...Z`. */
export const instantSchema = z.iso.datetime({
  offset: true,
  error: 'Enter a date and time with its offset, e.g. 2026-11-30T18:05:00+01:00',
});

/** A calendar date, `YYYY-MM-DD`. */
export const dateSchema = z.iso.date({ error: 'Enter a date as YYYY-MM-DD' });

/** True when the runtime knows this IANA time-zone name (`Europe/London`, `UTC`). */
export function isTimeZone(value: string): boolean {
  try {
    new Intl.DateTimeFormat('en', { timeZone: value });
    return value.length > 0 && value.length <= 64;
  } catch {
    return false;
  }
}

export const timeZoneSchema = z
  .string()
  .refine(isTimeZone, { error: 'Enter an IANA time zone, e.g. Europe/London' });

export function boundedText(max: number, { required = true } = {}) {
  const text = z
    .string()
    .trim()
    .max(max, { error: `At most ${max} characters` });
  return required ? text.min(1, { error: 'Required' }) : text;
}

/** The version the editor last saw; a stale one gets 409. */
export const versionSchema = z.number().int().min(1);

/** A page of a list, with the total across all pages. */
export interface Page<T> {
  items: T[];
  total: number;
  page: number;
  pageSize: number;
}

/** A person as other records show them. */
export interface PersonRef {
  id: string;
  displayName: string;
}
