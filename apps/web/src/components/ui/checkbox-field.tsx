import { Checkbox, Flex, Text } from '@radix-ui/themes';
import type { ReactNode, Ref } from 'react';
import { describedBy } from './field-frame';
import { useFieldIds } from './use-field-ids';

interface CheckboxFieldProps {
  label: string;
  checked: boolean;
  onCheckedChange: (checked: boolean) => void;
  hint?: ReactNode;
  error?: string;
  disabled?: boolean;
  name?: string;
  buttonRef?: Ref<HTMLButtonElement>;
}

/** A Radix checkbox with its label beside it and its hint under both. */
export function CheckboxField({
  label,
  checked,
  onCheckedChange,
  hint,
  error,
  disabled,
  name,
  buttonRef,
}: CheckboxFieldProps) {
  const ids = useFieldIds();
  return (
    <Flex direction="column" gap="1">
      <Text as="label" size="2" htmlFor={ids.controlId}>
        <Flex gap="2" align="center">
          <Checkbox
            ref={buttonRef}
            id={ids.controlId}
            name={name}
            checked={checked}
            disabled={disabled}
            onCheckedChange={(next) => onCheckedChange(next === true)}
            {...describedBy(ids, hint, error)}
          />
          <Text weight="bold">{label}</Text>
        </Flex>
      </Text>
      {hint ? (
        <Text id={ids.hintId} size="1" color="gray">
          {hint}
        </Text>
      ) : null}
      {error ? (
        <Text id={ids.errorId} size="2" color="red" className="sl-field-error">
          {error}
        </Text>
      ) : null}
    </Flex>
  );
}
