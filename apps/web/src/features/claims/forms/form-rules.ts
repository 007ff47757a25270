import { z } from 'zod';
import { isLocalDateTime } from '@/lib/zoned-time';

/** The value of an `<input type="datetime-local">`, which the browser leaves empty until whole. */
export const localDateTimeSchema = z
  .string()
  .refine(isLocalDateTime, { error: 'Enter the date and the time' });

/** An optional text field: empty means not given, and is sent as nothing at all. */
export function optionalText(value: string): string | undefined {
  const trimmed = value.trim();
  return trimmed === '' ? undefined : trimmed;
}

interface IssueTarget {
  /** Where the sub-schema sits in the form, e.g. `['appearance']`. */
  prefix?: readonly PropertyKey[];
  /** The form's name for a request field, e.g. `contactedAt` → `contactedAtLocal`. */
  rename?: (field: string) => string;
}

/**
 * Copies the issues of a request schema's check onto the form's own fields. An issue deep
 * inside a field (`topics.1`) lands on the field itself, where the form can show it.
 */
export function addIssuesAt(
  ctx: z.RefinementCtx,
  result: { error?: z.ZodError },
  { prefix = [], rename = (field) => field }: IssueTarget = {},
): void {
  for (const issue of result.error?.issues ?? []) {
    const [head] = issue.path;
    const path = head === undefined ? [] : [rename(String(head))];
    ctx.addIssue({ code: 'custom', message: issue.message, path: [...prefix, ...path] });
  }
}
