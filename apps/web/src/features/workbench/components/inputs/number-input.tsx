import { Checkbox, Flex, Select, Text, TextField, VisuallyHidden } from '@radix-ui/themes';
import { formatNumber, type Distribution, type NumberInputSpec } from '@skyledger/calc';
import { useId } from 'react';
import { parseNumber, plainNumber, type NumberFieldState } from '../../form/form-state';
import { convertBetween, unitChoices, unitLabel } from '../../form/unit-choices';
import { SourceCitation } from '../results/source-citation';
import { describedByIds, InputError } from './input-error';

interface NumberInputProps {
  spec: NumberInputSpec;
  field: NumberFieldState;
  onChange: (field: NumberFieldState) => void;
  error?: string;
}

const distributions: readonly { value: Distribution; label: string }[] = [
  { value: 'uniform', label: 'Uniform' },
  { value: 'normal', label: 'Normal (5–95 %)' },
  { value: 'lognormal', label: 'Lognormal (5–95 %)' },
];

// Radix Select keeps '' for "nothing chosen"; a plain number's unit is written `1` in it.
const toSelectValue = (unit: string) => (unit === '' ? '1' : unit);
const fromSelectValue = (value: string) => (value === '1' ? '' : value);

function withUnit(value: number, unit: string): string {
  return unit === '' ? formatNumber(value, 6) : `${formatNumber(value, 6)} ${unitLabel(unit)}`;
}

/** Default, source and allowed range of a number input, in its declared unit. */
function NumberFacts({ spec, id }: { spec: NumberInputSpec; id: string }) {
  const range = spec.integer
    ? `whole numbers from ${formatNumber(spec.min)} to ${formatNumber(spec.max)}`
    : `from ${withUnit(spec.min, spec.unit)} to ${withUnit(spec.max, spec.unit)}`;
  return (
    <Text id={id} size="1" color="gray">
      {spec.default === null ? (
        'Optional: leave it empty to leave it out. '
      ) : (
        <>
          Default {withUnit(spec.default, spec.unit)}
          {spec.source ? (
            <>
              {' '}
              (source: <SourceCitation sourceKey={spec.source} />)
            </>
          ) : null}
          .{' '}
        </>
      )}
      Allowed: {range}.
    </Text>
  );
}

/**
 * A number input generated from its declaration: the value (or a low–high range with its
 * distribution), a unit picker where other units make sense, and its help, default,
 * source and allowed range beside it.
 */
export function NumberInput({ spec, field, onChange, error }: NumberInputProps) {
  const id = useId();
  const ids = {
    label: `${id}-label`,
    value: `${id}-value`,
    low: `${id}-low`,
    high: `${id}-high`,
    range: `${id}-range`,
    help: `${id}-help`,
    facts: `${id}-facts`,
    error: `${id}-error`,
  };
  const units = unitChoices(spec);
  const described = describedByIds(ids.help, ids.facts, error && ids.error);
  const invalid = error ? true : undefined;
  const mayRange = spec.allowRange !== false;

  // The same quantity in the new unit: 1360.8 W/m² becomes 1.3608 kW/m², 288 K 14.85 °C.
  const inUnit = (text: string, unit: string) => {
    const value = parseNumber(text);
    return value === undefined ? text : plainNumber(convertBetween(value, field.unit, unit, spec));
  };
  const changeUnit = (unit: string) =>
    onChange({
      ...field,
      unit,
      value: inUnit(field.value, unit),
      low: inUnit(field.low, unit),
      high: inUnit(field.high, unit),
    });
  const toggleRange = (ranged: boolean) => {
    const start = field.value.trim() || (spec.default === null ? '' : plainNumber(spec.default));
    onChange({
      ...field,
      ranged,
      low: ranged && field.low === '' ? start : field.low,
      high: ranged && field.high === '' ? start : field.high,
    });
  };
  const box = (key: 'value' | 'low' | 'high', extra: object) => (
    <TextField.Root
      id={ids[key]}
      size="3"
      inputMode="decimal"
      autoComplete="off"
      value={field[key]}
      onChange={(event) => onChange({ ...field, [key]: event.target.value })}
      aria-describedby={described}
      aria-invalid={invalid}
      className="sl-wb-number"
      {...extra}
    />
  );

  return (
    <Flex direction="column" gap="1">
      <Text
        as="label"
        id={ids.label}
        htmlFor={field.ranged ? ids.low : ids.value}
        size="2"
        weight="bold"
      >
        {spec.label}
      </Text>
      <Flex gap="2" align="end" wrap="wrap">
        {field.ranged ? (
          <>
            <Flex direction="column" gap="1">
              <Text as="label" htmlFor={ids.low} size="1" id={`${ids.low}-label`}>
                Low
              </Text>
              {box('low', { 'aria-labelledby': `${ids.label} ${ids.low}-label` })}
            </Flex>
            <Flex direction="column" gap="1">
              <Text as="label" htmlFor={ids.high} size="1" id={`${ids.high}-label`}>
                High
              </Text>
              {box('high', { 'aria-labelledby': `${ids.label} ${ids.high}-label` })}
            </Flex>
          </>
        ) : (
          box('value', { placeholder: spec.default === null ? 'optional' : undefined })
        )}
        {units.length > 1 ? (
          <Select.Root
            size="3"
            value={toSelectValue(field.unit)}
            onValueChange={(value) => changeUnit(fromSelectValue(value))}
          >
            <Select.Trigger aria-label={`Unit of ${spec.label}`} variant="soft" color="gray" />
            <Select.Content position="popper">
              {units.map((unit) => (
                <Select.Item key={unit} value={toSelectValue(unit)}>
                  {unitLabel(unit)}
                </Select.Item>
              ))}
            </Select.Content>
          </Select.Root>
        ) : spec.unit ? (
          <Text size="2" className="sl-wb-unit">
            {unitLabel(spec.unit)}
          </Text>
        ) : null}
        {field.ranged ? (
          <Select.Root
            size="3"
            value={field.distribution}
            onValueChange={(value) =>
              onChange({
                ...field,
                distribution:
                  distributions.find((option) => option.value === value)?.value ?? 'uniform',
              })
            }
          >
            <Select.Trigger
              aria-label={`How ${spec.label} is spread`}
              variant="soft"
              color="gray"
            />
            <Select.Content position="popper">
              {distributions
                .filter((option) => option.value === 'uniform' || !spec.integer)
                .map((option) => (
                  <Select.Item key={option.value} value={option.value}>
                    {option.label}
                  </Select.Item>
                ))}
            </Select.Content>
          </Select.Root>
        ) : null}
      </Flex>
      {mayRange ? (
        <Text as="label" size="2" htmlFor={ids.range}>
          <Flex gap="2" align="center">
            <Checkbox
              id={ids.range}
              checked={field.ranged}
              onCheckedChange={(checked) => toggleRange(checked === true)}
            />
            <span>
              Give a range <VisuallyHidden>for {spec.label} </VisuallyHidden>(the result becomes a
              5–95 % band)
            </span>
          </Flex>
        </Text>
      ) : null}
      <Text id={ids.help} size="1" color="gray">
        {spec.help}
        {field.ranged
          ? ' Uniform: every value from low to high is as likely. Normal and lognormal: low and high are the 5th and 95th percentiles.'
          : ''}
      </Text>
      <NumberFacts spec={spec} id={ids.facts} />
      <InputError id={ids.error} message={error} />
    </Flex>
  );
}
