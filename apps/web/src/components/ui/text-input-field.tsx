import { TextField } from '@radix-ui/themes';
import type { ComponentProps, ReactNode } from 'react';
import { describedBy, FieldFrame } from './field-frame';
import { useFieldIds } from './use-field-ids';

type TextInputFieldProps = Omit<ComponentProps<typeof TextField.Root>, 'id'> & {
  label: string;
  hint?: ReactNode;
  /** The message to show under the field: client validation or the API's field error. */
  error?: string;
};

export function TextInputField({ label, hint, error, ...inputProps }: TextInputFieldProps) {
  const ids = useFieldIds();
  return (
    <FieldFrame ids={ids} label={label} hint={hint} error={error}>
      <TextField.Root
        size="3"
        id={ids.controlId}
        {...describedBy(ids, hint, error)}
        {...inputProps}
      />
    </FieldFrame>
  );
}
