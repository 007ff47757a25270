import { Box, Flex, Heading, Text } from '@radix-ui/themes';
import { useId, useState, type ReactNode } from 'react';
import { ScrollTable } from './scroll-table';

export interface ChartTable {
  /** Column headings, units included, e.g. `Year`, `Anomaly (K)`. */
  columns: readonly string[];
  rows: readonly (readonly string[])[];
  /** Rows beyond this are left out of the page, with a note saying where they are. */
  maxRows?: number;
  /** Where the rows left out can be found, e.g. "in the CSV download". */
  restAt?: string;
}

interface ChartFigureProps {
  title: string;
  /** The text alternative: what the picture shows, in words. */
  summary: string;
  /** The drawing itself; hidden from screen readers, which read the summary and the table. */
  chart: ReactNode;
  table: ChartTable;
}

/**
 * A chart with its title, a text alternative under it and its data as a table on demand
 * (built only when opened, so a long series costs nothing until asked for).
 */
export function ChartFigure({ title, summary, chart, table }: ChartFigureProps) {
  const titleId = useId();
  const [tableOpen, setTableOpen] = useState(false);
  const shown = table.rows.slice(0, table.maxRows ?? 1000);
  return (
    <Flex asChild direction="column" gap="2" m="0">
      <figure aria-labelledby={titleId}>
        <Heading as="h3" size="3" id={titleId}>
          {title}
        </Heading>
        <Box aria-hidden className="sl-chart">
          {chart}
        </Box>
        <Text as="p" size="2" color="gray" className="sl-chart-summary">
          {summary}
        </Text>
        <details onToggle={(event) => setTableOpen(event.currentTarget.open)}>
          <Text asChild size="2" weight="medium">
            <summary className="sl-details-summary">Show the data as a table</summary>
          </Text>
          {tableOpen ? (
            <Flex direction="column" gap="2" mt="2">
              <ScrollTable
                caption={`${title}: data`}
                columns={table.columns}
                rows={shown}
                rowHeaders
                numeric
              />
              {table.rows.length > shown.length ? (
                <Text size="1" color="gray">
                  The first {shown.length} of {table.rows.length} rows
                  {table.restAt ? `; all of them are ${table.restAt}` : ''}.
                </Text>
              ) : null}
            </Flex>
          ) : null}
        </details>
      </figure>
    </Flex>
  );
}
