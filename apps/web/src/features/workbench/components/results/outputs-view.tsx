import { Box, Flex, Heading, Table, Text, VisuallyHidden } from '@radix-ui/themes';
import {
  displayUnit,
  formatNumber,
  type CalculatorOutput,
  type CalculatorOutputInfo,
  type TableOutput,
} from '@skyledger/calc';
import { ScrollTable } from '@/components/ui/scroll-table';
import { cellText, quantityText } from '@/features/workings/format-values';

interface OutputsViewProps {
  /** The calculator's output declarations: labels and the order to show them in. */
  info: readonly CalculatorOutputInfo[];
  outputs: Readonly<Record<string, CalculatorOutput>>;
  /** Outputs shown elsewhere (a chart's table, the worksheet's lines). */
  hidden?: ReadonlySet<string>;
}

const listText = (values: readonly number[], unit: string) =>
  `${values.map((value) => formatNumber(value)).join(', ')}${unit ? ` ${displayUnit(unit)}` : ''}`;

function Quantity({
  output,
  pick,
}: {
  output: CalculatorOutput;
  pick: 'value' | 'p5' | 'p50' | 'p95';
}) {
  if (output.kind === 'number') {
    const value = pick === 'value' ? output.value : output.band?.[pick];
    return value === undefined ? '—' : quantityText(value, output.unit);
  }
  if (output.kind === 'list') {
    const values = pick === 'value' ? output.value : output.band?.[pick];
    return values === undefined ? '—' : listText(values, output.unit);
  }
  return null;
}

function OutputTable({ label, output }: { label: string; output: TableOutput }) {
  const rows = output.value as readonly Record<string, unknown>[];
  return (
    <Flex direction="column" gap="2">
      <Heading as="h3" size="3">
        {label}
      </Heading>
      <ScrollTable
        caption={label}
        columns={output.columns.map((column) =>
          column.unit ? `${column.label} (${displayUnit(column.unit)})` : column.label,
        )}
        rows={rows.map((row) => output.columns.map((column) => cellText(row[column.key])))}
        numeric
      />
    </Flex>
  );
}

/**
 * A result's outputs: numbers and lists in one table (with their 5th, 50th and 95th
 * percentiles when an input was a range), then texts and tables.
 */
export function OutputsView({ info, outputs, hidden }: OutputsViewProps) {
  const present = info.filter((entry) => outputs[entry.name] && !hidden?.has(entry.name));
  const quantities = present.filter((entry) => entry.kind === 'number' || entry.kind === 'list');
  const banded = quantities.some((entry) => {
    const output = outputs[entry.name];
    return output && 'band' in output && output.band !== undefined;
  });
  return (
    <Flex direction="column" gap="4">
      {quantities.length > 0 ? (
        <Table.Root size="2" variant="surface">
          <VisuallyHidden asChild>
            <caption>Outputs</caption>
          </VisuallyHidden>
          <Table.Header>
            <Table.Row>
              <Table.ColumnHeaderCell>Output</Table.ColumnHeaderCell>
              {banded ? (
                <>
                  <Table.ColumnHeaderCell>5th percentile</Table.ColumnHeaderCell>
                  <Table.ColumnHeaderCell>Median (50th)</Table.ColumnHeaderCell>
                  <Table.ColumnHeaderCell>95th percentile</Table.ColumnHeaderCell>
                </>
              ) : (
                <Table.ColumnHeaderCell>Value</Table.ColumnHeaderCell>
              )}
            </Table.Row>
          </Table.Header>
          <Table.Body>
            {quantities.map((entry) => {
              const output = outputs[entry.name]!;
              const hasBand = 'band' in output && output.band !== undefined;
              return (
                <Table.Row key={entry.name}>
                  <Table.RowHeaderCell>
                    {entry.label}
                    {entry.help ? (
                      <Text as="div" size="1" color="gray">
                        {entry.help}
                      </Text>
                    ) : null}
                  </Table.RowHeaderCell>
                  {banded && !hasBand ? (
                    <Table.Cell colSpan={3}>
                      <Quantity output={output} pick="value" />
                    </Table.Cell>
                  ) : (
                    (banded ? (['p5', 'p50', 'p95'] as const) : (['value'] as const)).map(
                      (pick) => (
                        <Table.Cell key={pick} className="sl-nowrap">
                          {/* The central figure in bold: the value, or the median of a band. */}
                          <Text weight={pick === 'value' || pick === 'p50' ? 'bold' : undefined}>
                            <Quantity output={output} pick={pick} />
                          </Text>
                        </Table.Cell>
                      ),
                    )
                  )}
                </Table.Row>
              );
            })}
          </Table.Body>
        </Table.Root>
      ) : null}
      {present.map((entry) => {
        const output = outputs[entry.name]!;
        if (output.kind === 'text') {
          return (
            <Box key={entry.name}>
              <Heading as="h3" size="3" mb="1">
                {entry.label}
              </Heading>
              <Text as="p" className="sl-prose">
                {output.value}
              </Text>
            </Box>
          );
        }
        if (output.kind === 'table') {
          return <OutputTable key={entry.name} label={entry.label} output={output} />;
        }
        return null;
      })}
    </Flex>
  );
}
