import type { ReactNode } from 'react';
import { Controller, type Control, type FieldValues, type Path } from 'react-hook-form';
import { SelectField } from './select-field';

interface ControlledSelectProps<T extends FieldValues> {
  control: Control<T>;
  name: Path<T>;
  label: string;
  options: readonly { value: string; label: string }[];
  placeholder?: string;
  /** Shown under the field; a function of the chosen value, for hints that follow the choice. */
  hint?: ReactNode | ((value: string) => ReactNode);
}

/** A SelectField bound to a react-hook-form field, showing that field's own error. */
export function ControlledSelect<T extends FieldValues>({
  control,
  name,
  label,
  options,
  placeholder,
  hint,
}: ControlledSelectProps<T>) {
  return (
    <Controller
      control={control}
      name={name}
      render={({ field, fieldState }) => (
        <SelectField<string>
          label={label}
          name={field.name}
          value={field.value as string}
          options={options}
          onValueChange={field.onChange}
          triggerRef={field.ref}
          placeholder={placeholder}
          hint={typeof hint === 'function' ? hint(field.value as string) : hint}
          error={fieldState.error?.message}
        />
      )}
    />
  );
}
