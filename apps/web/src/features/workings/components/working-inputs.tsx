import { DataList, Flex, Text } from '@radix-ui/themes';
import type { CalculatorInfo, InputSpec } from '@skyledger/calc';
import type { DatasetSeriesRef, WorkingView } from '@skyledger/contracts';
import { inputText } from '../format-values';
import { seriesShown } from '../series-values';
import { DatasetRefLink } from './dataset-ref-link';

type Refs = readonly DatasetSeriesRef[];

function SeriesValue({ value, refs }: { value: unknown; refs: Refs }) {
  const shown = seriesShown(value, refs);
  const unpaired = refs.length > 0 && shown.every((series) => series.ref === null);
  return (
    <Flex direction="column" gap="1">
      {shown.map((series, index) => (
        <Text key={index} size="2">
          {series.name ? <Text weight="medium">{series.name}: </Text> : null}
          {series.ref ? (
            <>
              <DatasetRefLink datasetRef={series.ref} />,{' '}
            </>
          ) : null}
          {series.span}
        </Text>
      ))}
      {unpaired
        ? refs.map((ref) => (
            <Text key={`${ref.dataset}:${ref.column}`} size="2">
              Read from <DatasetRefLink datasetRef={ref} />
            </Text>
          ))
        : null}
    </Flex>
  );
}

function InputValue({
  spec,
  value,
  refs,
}: {
  spec: InputSpec | undefined;
  value: unknown;
  refs: Refs;
}) {
  if (spec?.kind === 'series' || spec?.kind === 'seriesList' || refs.length > 0) {
    return <SeriesValue value={value} refs={refs} />;
  }
  return <Text className="sl-pre-line sl-break">{inputText(spec, value)}</Text>;
}

/** The inputs the server ran with, in the calculator's order, each with its unit. */
export function WorkingInputs({
  working,
  calculator,
}: {
  working: WorkingView;
  calculator: CalculatorInfo | undefined;
}) {
  const specs = calculator?.inputs ?? [];
  const names = [
    ...specs.map((spec) => spec.name).filter((name) => name in working.inputs),
    ...Object.keys(working.inputs).filter((name) => !specs.some((spec) => spec.name === name)),
  ];
  return (
    <DataList.Root orientation={{ initial: 'vertical', sm: 'horizontal' }} size="2">
      {names.map((name) => {
        const spec = specs.find((candidate) => candidate.name === name);
        return (
          <DataList.Item key={name}>
            <DataList.Label minWidth="14rem">{spec?.label ?? name}</DataList.Label>
            <DataList.Value>
              <InputValue
                spec={spec}
                value={working.inputs[name]}
                refs={working.datasetRefs?.[name] ?? []}
              />
            </DataList.Value>
          </DataList.Item>
        );
      })}
    </DataList.Root>
  );
}
