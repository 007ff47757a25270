import { Flex, RadioGroup, Text } from '@radix-ui/themes';
import type { ChoiceInputSpec } from '@skyledger/calc';
import { useId } from 'react';
import { SourceCitation } from '../results/source-citation';
import { describedByIds, InputError } from './input-error';

interface ChoiceInputProps {
  spec: ChoiceInputSpec;
  value: string;
  onChange: (value: string) => void;
  error?: string;
}

/** One of a calculator's fixed choices, all in view as radio buttons. */
export function ChoiceInput({ spec, value, onChange, error }: ChoiceInputProps) {
  const id = useId();
  const defaultLabel = spec.choices.find((choice) => choice.value === spec.default)?.label;
  return (
    <Flex direction="column" gap="2">
      <Text id={`${id}-label`} size="2" weight="bold">
        {spec.label}
      </Text>
      <RadioGroup.Root
        value={value}
        onValueChange={onChange}
        aria-labelledby={`${id}-label`}
        aria-describedby={describedByIds(`${id}-help`, error && `${id}-error`)}
      >
        {spec.choices.map((choice) => (
          <RadioGroup.Item key={choice.value} value={choice.value}>
            {choice.label}
          </RadioGroup.Item>
        ))}
      </RadioGroup.Root>
      <Text id={`${id}-help`} size="1" color="gray">
        {spec.help} Default: {defaultLabel}
        {spec.source ? (
          <>
            {' '}
            (source: <SourceCitation sourceKey={spec.source} />)
          </>
        ) : null}
        .
      </Text>
      <InputError id={`${id}-error`} message={error} />
    </Flex>
  );
}
