import { DataList, Flex, Text } from '@radix-ui/themes';
import { displayUnit, type CalculatorInfo } from '@skyledger/calc';
import type { WorkingOutput, WorkingView } from '@skyledger/contracts';
import { ScrollTable } from '@/components/ui/scroll-table';
import { bandText, cellText, isBand, isListBand, outputText, quantityText } from '../format-values';

interface NamedOutput {
  name: string;
  label: string;
  output: WorkingOutput;
}

function ListValue({ output }: { output: WorkingOutput }) {
  const values = Array.isArray(output.value) ? (output.value as number[]) : [];
  const band = isListBand(output.band) ? output.band : null;
  if (!band) return <Text weight="bold">{outputText(output)}</Text>;
  return (
    <ol className="sl-list">
      {values.map((value, index) => (
        <li key={index}>
          <Text weight="bold">{quantityText(value, output.unit)}</Text>
          <Text size="2" color="gray">
            {' '}
            ·{' '}
            {bandText(
              { p5: band.p5[index]!, p50: band.p50[index]!, p95: band.p95[index]! },
              output.unit,
            )}
          </Text>
        </li>
      ))}
    </ol>
  );
}

/** A table output under its label, units in the headings, scrolling in its own box. */
export function TableOutputView({ label, output }: { label: string; output: WorkingOutput }) {
  const rows = Array.isArray(output.value) ? (output.value as Record<string, unknown>[]) : [];
  const columns = output.columns ?? [];
  return (
    <Flex direction="column" gap="1">
      <Text weight="bold" size="2">
        {label}
      </Text>
      <ScrollTable
        caption={label}
        columns={columns.map((column) =>
          column.unit ? `${column.label} (${displayUnit(column.unit)})` : column.label,
        )}
        rows={rows.map((row) =>
          columns.map(({ key }) =>
            // The worksheet's lines carry their unit as mathjs writes it: show it as the steps do.
            key === 'unit' && typeof row[key] === 'string'
              ? displayUnit(row[key])
              : cellText(row[key]),
          ),
        )}
        numeric
      />
    </Flex>
  );
}

/**
 * The outputs of a working with their units, and their 5th–95th percentile band where an
 * input was a range: numbers and lists as a list of values, texts and tables after them.
 */
export function WorkingOutputs({
  working,
  calculator,
}: {
  working: WorkingView;
  calculator: CalculatorInfo | undefined;
}) {
  const declared = calculator?.outputs ?? [];
  const outputs: NamedOutput[] = [
    ...declared.map((info) => info.name),
    ...Object.keys(working.outputs).filter((name) => !declared.some((info) => info.name === name)),
  ].flatMap((name) => {
    const output = working.outputs[name];
    const label = declared.find((info) => info.name === name)?.label ?? name;
    return output ? [{ name, label, output }] : [];
  });
  const values = outputs.filter(({ output }) => output.kind === 'number' || output.kind === 'list');
  const texts = outputs.filter(({ output }) => output.kind === 'text');
  const tables = outputs.filter(({ output }) => output.kind === 'table');

  return (
    <Flex direction="column" gap="4">
      {values.length > 0 ? (
        <DataList.Root orientation={{ initial: 'vertical', sm: 'horizontal' }} size="2">
          {values.map(({ name, label, output }) => (
            <DataList.Item key={name}>
              <DataList.Label minWidth="14rem">{label}</DataList.Label>
              <DataList.Value>
                {output.kind === 'list' ? (
                  <ListValue output={output} />
                ) : (
                  <Flex direction="column">
                    <Text weight="bold">{quantityText(Number(output.value), output.unit)}</Text>
                    {isBand(output.band) ? (
                      <Text size="2" color="gray">
                        {bandText(output.band, output.unit)}
                      </Text>
                    ) : null}
                  </Flex>
                )}
              </DataList.Value>
            </DataList.Item>
          ))}
        </DataList.Root>
      ) : null}
      {texts.map(({ name, label, output }) => (
        <Flex key={name} direction="column" gap="1">
          <Text weight="bold" size="2">
            {label}
          </Text>
          <Text as="p" className="sl-prose" size="2">
            {String(output.value)}
          </Text>
        </Flex>
      ))}
      {tables.map(({ name, label, output }) => (
        <TableOutputView key={name} label={label} output={output} />
      ))}
    </Flex>
  );
}
