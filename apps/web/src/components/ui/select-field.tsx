import { Select } from '@radix-ui/themes';
import type { ReactNode, Ref } from 'react';
import { describedBy, FieldFrame } from './field-frame';
import { useFieldIds } from './use-field-ids';

interface SelectFieldProps<V extends string> {
  label: string;
  value: V;
  options: readonly { value: V; label: string }[];
  onValueChange: (value: V) => void;
  name?: string;
  hint?: ReactNode;
  error?: string;
  disabled?: boolean;
  triggerRef?: Ref<HTMLButtonElement>;
  /** Shown while nothing is chosen (`value` is ''). */
  placeholder?: string;
}

/** A labelled Radix Select whose trigger carries the field's hint and error. */
export function SelectField<V extends string>({
  label,
  value,
  options,
  onValueChange,
  name,
  hint,
  error,
  disabled,
  triggerRef,
  placeholder,
}: SelectFieldProps<V>) {
  const ids = useFieldIds();
  const isOption = (candidate: string): candidate is V =>
    options.some((option) => option.value === candidate);
  return (
    <FieldFrame ids={ids} label={label} hint={hint} error={error}>
      <Select.Root
        size="3"
        name={name}
        value={value}
        disabled={disabled}
        onValueChange={(next) => {
          if (isOption(next)) onValueChange(next);
        }}
      >
        <Select.Trigger
          ref={triggerRef}
          id={ids.controlId}
          aria-labelledby={ids.labelId}
          placeholder={placeholder}
          {...describedBy(ids, hint, error)}
        />
        <Select.Content position="popper">
          {options.map((option) => (
            <Select.Item key={option.value} value={option.value}>
              {option.label}
            </Select.Item>
          ))}
        </Select.Content>
      </Select.Root>
    </FieldFrame>
  );
}
