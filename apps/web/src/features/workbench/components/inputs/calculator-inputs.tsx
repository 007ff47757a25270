import { Flex } from '@radix-ui/themes';
import type { InputSpec, WorksheetLineResult } from '@skyledger/calc';
import { TextInputField } from '@/components/ui/text-input-field';
import type { FieldState, FormState } from '../../form/form-state';
import { ChoiceInput } from './choice-input';
import { LinesInput } from './lines-input';
import { NumberInput } from './number-input';
import { SeriesInput } from './series-input';
import { SeriesListInput } from './series-list-input';

interface CalculatorInputsProps {
  inputs: readonly InputSpec[];
  form: FormState;
  /** A field changed; `unit` is the unit of a dataset column just chosen for a series. */
  onChange: (name: string, field: FieldState, unit?: string) => void;
  /** The rule each input broke, by input name. */
  errors: Readonly<Record<string, string>>;
  lineResults?: readonly WorksheetLineResult[];
}

function InputFor({
  spec,
  field,
  onChange,
  error,
  lineResults,
}: {
  spec: InputSpec;
  field: FieldState;
  onChange: (field: FieldState, unit?: string) => void;
  error: string | undefined;
  lineResults?: readonly WorksheetLineResult[];
}) {
  if (spec.kind === 'number' && field.kind === 'number') {
    return <NumberInput spec={spec} field={field} onChange={onChange} error={error} />;
  }
  if (spec.kind === 'choice' && field.kind === 'choice') {
    return (
      <ChoiceInput
        spec={spec}
        value={field.value}
        onChange={(value) => onChange({ kind: 'choice', value })}
        error={error}
      />
    );
  }
  if (spec.kind === 'text' && field.kind === 'text') {
    return (
      <TextInputField
        label={spec.label}
        hint={spec.help}
        value={field.value}
        maxLength={spec.maxLength}
        onChange={(event) => onChange({ kind: 'text', value: event.target.value })}
        error={error}
      />
    );
  }
  if (spec.kind === 'series' && field.kind === 'series') {
    return (
      <SeriesInput
        spec={spec}
        source={field.source}
        onChange={(source, unit) => onChange({ kind: 'series', source }, unit)}
        error={error}
      />
    );
  }
  if (spec.kind === 'seriesList' && field.kind === 'seriesList') {
    return (
      <SeriesListInput
        spec={spec}
        items={field.items}
        onChange={(items, unit) => onChange({ kind: 'seriesList', items }, unit)}
        error={error}
      />
    );
  }
  if (spec.kind === 'lines' && field.kind === 'lines') {
    return (
      <LinesInput
        spec={spec}
        text={field.text}
        onChange={(text) => onChange({ kind: 'lines', text })}
        lineResults={lineResults}
        error={error}
      />
    );
  }
  return null;
}

/** The calculator's form, one control per declared input, in the declared order. */
export function CalculatorInputs({
  inputs,
  form,
  onChange,
  errors,
  lineResults,
}: CalculatorInputsProps) {
  return (
    <Flex direction="column" gap="5">
      {inputs.map((spec) => {
        const field = form[spec.name];
        return field ? (
          <InputFor
            key={spec.name}
            spec={spec}
            field={field}
            onChange={(next, unit) => onChange(spec.name, next, unit)}
            error={errors[spec.name]}
            lineResults={lineResults}
          />
        ) : null;
      })}
    </Flex>
  );
}
