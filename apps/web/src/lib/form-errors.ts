import type { FieldValues, Path, UseFormSetError } from 'react-hook-form';
import { isApiError } from './api-client';
import { errorMessage, fieldErrorMessage, type FieldCodeOverrides } from './api-error-messages';

export interface ApplyApiErrorOptions<T extends FieldValues> {
  /** The form's fields that can show an error of their own. */
  fields: readonly Path<T>[];
  overrides?: FieldCodeOverrides;
  /** A sentence for a status that means something particular on this form (e.g. 410). */
  statusMessages?: Partial<Record<number, string>>;
  /**
   * Where an API field shows on this form when the form names it otherwise, e.g.
   * `firstAppearance.seenAt` → `firstAppearance.seenAtLocal`; `topics.2` → `topics`.
   */
  formField?: (apiField: string) => string;
}

/**
 * Puts an API error on the form: each `fields` entry the form has goes under its
 * field, everything else becomes the form-level error `root.server`.
 */
export function applyApiError<T extends FieldValues>(
  error: unknown,
  setError: UseFormSetError<T>,
  { fields, overrides, statusMessages, formField = (field) => field }: ApplyApiErrorOptions<T>,
): void {
  const known: readonly string[] = fields;
  const fieldErrors = isApiError(error)
    ? Object.entries(error.body.fields ?? {}).map(
        ([field, code]) => [formField(field), code] as const,
      )
    : [];
  const placed = fieldErrors.filter(([field]) => known.includes(field));

  placed.forEach(([field, code], index) => {
    const message = fieldErrorMessage(
      field,
      code,
      isApiError(error) ? error.message : '',
      overrides,
    );
    setError(field as Path<T>, { type: 'server', message }, { shouldFocus: index === 0 });
  });
  if (placed.length > 0 && placed.length === fieldErrors.length) return;

  const statusMessage = isApiError(error) ? statusMessages?.[error.status] : undefined;
  setError('root.server', { type: 'server', message: statusMessage ?? errorMessage(error) });
}
