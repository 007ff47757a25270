import { isApiError } from './api-client';

/** Words for the rule codes the API puts in `fields` (class-validator names and our own). */
const fieldCodeMessages: Record<string, string> = {
  isEmail: 'Enter a valid e-mail address',
  isNotEmpty: 'This cannot be empty',
  minLength: 'This is too short',
  maxLength: 'This is too long',
  isIn: 'Choose one of the listed options',
  isEnum: 'Choose one of the listed options',
  isString: 'Enter text here',
  taken: 'This e-mail address already has an account on the desk',
  stale: 'Someone else changed this meanwhile',
  lastDeskChief: 'The desk needs at least one active desk chief',
  self: "You can't do this to your own account",
};

/** Field-specific wording where the generic words would be vague. */
export type FieldCodeOverrides = Record<string, Partial<Record<string, string>>>;

export function fieldErrorMessage(
  field: string,
  code: string,
  fallback: string,
  overrides: FieldCodeOverrides = {},
): string {
  return overrides[field]?.[code] ?? fieldCodeMessages[code] ?? fallback;
}

/** A sentence for the person for any error a request can end with. */
export function errorMessage(error: unknown): string {
  if (!isApiError(error)) return 'Something went wrong on this page. Try again.';
  switch (error.status) {
    case 0:
      return error.message;
    case 403:
      return "You don't have access to this.";
    case 429:
      return 'Too many attempts in a short time. Wait a minute, then try again.';
    default:
      if (error.status >= 500) {
        return 'The desk server ran into a problem. Try again in a moment.';
      }
      return error.message;
  }
}
