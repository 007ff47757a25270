import { PlusIcon } from '@radix-ui/react-icons';
import { Button, Card, Flex, Text } from '@radix-ui/themes';
import type { SeriesListInputSpec } from '@skyledger/calc';
import { useId } from 'react';
import { TextInputField } from '@/components/ui/text-input-field';
import { newSeriesListItem, type SeriesListItem, type SeriesSource } from '../../form/form-state';
import { InputError } from './input-error';
import { SeriesSourceFields } from './series-source-fields';

interface SeriesListInputProps {
  spec: SeriesListInputSpec;
  items: readonly SeriesListItem[];
  onChange: (items: SeriesListItem[], unit?: string) => void;
  error?: string;
}

/** Several named series, each from a dataset column or pasted, to compare side by side. */
export function SeriesListInput({ spec, items, onChange, error }: SeriesListInputProps) {
  const id = useId();
  const update = (key: string, change: Partial<SeriesListItem>, unit?: string) =>
    onChange(
      items.map((item) => (item.key === key ? { ...item, ...change } : item)),
      unit,
    );
  return (
    <Flex direction="column" gap="3" role="group" aria-labelledby={`${id}-label`}>
      <Text id={`${id}-label`} size="2" weight="bold">
        {spec.label}
      </Text>
      <Text size="1" color="gray">
        {spec.help} From {spec.minSeries} to {spec.maxSeries} series.
      </Text>
      {items.map((item, index) => {
        const label = `Series ${index + 1}`;
        return (
          <Card key={item.key} asChild>
            <section aria-label={label}>
              <Flex direction="column" gap="3">
                <Flex justify="between" align="center" gap="2">
                  <Text weight="bold">{label}</Text>
                  {items.length > spec.minSeries ? (
                    <Button
                      type="button"
                      variant="soft"
                      color="gray"
                      highContrast
                      size="1"
                      onClick={() => onChange(items.filter((other) => other.key !== item.key))}
                    >
                      Remove {label.toLowerCase()}
                    </Button>
                  ) : null}
                </Flex>
                <TextInputField
                  label="Name"
                  hint="Leave empty to use the column’s name."
                  value={item.name}
                  maxLength={60}
                  onChange={(event) => update(item.key, { name: event.target.value })}
                />
                <SeriesSourceFields
                  label={label}
                  source={item.source}
                  onChange={(source: SeriesSource, unit) => update(item.key, { source }, unit)}
                />
              </Flex>
            </section>
          </Card>
        );
      })}
      {items.length < spec.maxSeries ? (
        <Button
          type="button"
          variant="soft"
          highContrast
          onClick={() => onChange([...items, newSeriesListItem()])}
          className="sl-wb-start"
        >
          <PlusIcon aria-hidden />
          Add a series
        </Button>
      ) : null}
      <InputError id={`${id}-error`} message={error} />
    </Flex>
  );
}
