import { Flex, Text } from '@radix-ui/themes';
import type { SeriesInputSpec } from '@skyledger/calc';
import { useId } from 'react';
import type { SeriesSource } from '../../form/form-state';
import { SeriesSourceFields } from './series-source-fields';

interface SeriesInputProps {
  spec: SeriesInputSpec;
  source: SeriesSource;
  onChange: (source: SeriesSource, unit?: string) => void;
  error?: string;
}

/** A time series input: a dataset column or pasted points. */
export function SeriesInput({ spec, source, onChange, error }: SeriesInputProps) {
  const id = useId();
  return (
    <Flex direction="column" gap="2" role="group" aria-labelledby={`${id}-label`}>
      <Text id={`${id}-label`} size="2" weight="bold">
        {spec.label}
      </Text>
      <Text size="1" color="gray">
        {spec.help}
      </Text>
      <SeriesSourceFields label={spec.label} source={source} onChange={onChange} error={error} />
    </Flex>
  );
}
