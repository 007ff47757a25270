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
  isUrl: 'Enter a web address starting with http:// or https://',
  isISO8601: 'Enter a date and time',
  matches: 'Enter this in the form shown',
  isDateString: 'Enter a date',
  isTimeZone: 'Choose a time zone from the list',
  isUUID: 'Choose one from the list',
  isBoolean: 'Choose yes or no',
  isInt: 'Enter a whole number',
  min: 'This number is too small',
  max: 'This number is too large',
  required: 'This is required',
  notFound: 'This no longer exists on the desk; choose again',
  notAllowed: 'This cannot be sent here',
  alreadyLinked: 'This source is already cited for this claim',
  notAssignable: 'This person cannot research claims',
  unsupportedType:
    'The desk takes PDF, PNG, JPEG, WebP, CSV and plain-text files only, read from the bytes themselves',
  tooLarge: 'This file is larger than the desk accepts',
  notOnClaim: 'Choose a file uploaded to this claim',
  doiOrUrlRequired: 'Give a DOI or a web address so others can find the source',
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

/**
 * Words for a failed change: the stale-version sentence the screen chose, the first broken
 * rule in words, or what `errorMessage` says.
 */
export function changeErrorMessage(
  error: unknown,
  staleMessage: string,
  overrides: FieldCodeOverrides = {},
): string {
  if (isApiError(error) && error.status === 409 && error.body.fields?.version === 'stale') {
    return staleMessage;
  }
  const firstField = isApiError(error) ? Object.entries(error.body.fields ?? {})[0] : undefined;
  if (isApiError(error) && firstField) {
    return fieldErrorMessage(firstField[0], firstField[1], error.message, overrides);
  }
  return errorMessage(error);
}
