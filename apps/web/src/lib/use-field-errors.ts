import {
  get,
  useFormState,
  type Control,
  type FieldError,
  type FieldValues,
} from 'react-hook-form';

/**
 * The message of any field's error by its dotted name, for field groups that serve several
 * forms (`appearance.url` on one form and another alike).
 */
export function useFieldErrors<T extends FieldValues>(control: Control<T>) {
  const { errors } = useFormState({ control });
  return (name: string): string | undefined =>
    (get(errors, name) as FieldError | undefined)?.message;
}
