import type { ReactNode } from 'react';
import { Controller, type Control, type FieldValues, type Path } from 'react-hook-form';
import { CheckboxField } from './checkbox-field';

interface ControlledCheckboxProps<T extends FieldValues> {
  control: Control<T>;
  name: Path<T>;
  label: string;
  hint?: ReactNode;
  disabled?: boolean;
}

/** A CheckboxField bound to a react-hook-form boolean, showing that field's own error. */
export function ControlledCheckbox<T extends FieldValues>({
  control,
  name,
  label,
  hint,
  disabled,
}: ControlledCheckboxProps<T>) {
  return (
    <Controller
      control={control}
      name={name}
      render={({ field, fieldState }) => (
        <CheckboxField
          label={label}
          hint={hint}
          name={field.name}
          checked={field.value as boolean}
          disabled={disabled}
          onCheckedChange={field.onChange}
          buttonRef={field.ref}
          error={fieldState.error?.message}
        />
      )}
    />
  );
}
