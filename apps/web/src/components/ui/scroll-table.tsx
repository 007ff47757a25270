import { Box, Table, VisuallyHidden } from '@radix-ui/themes';
import type { ReactNode } from 'react';

interface ScrollTableProps {
  /** Names the table and its scrolling box for screen readers. */
  caption: string;
  columns: readonly string[];
  rows: readonly (readonly ReactNode[])[];
  /** The first cell of each row names the row (a time, a start year). */
  rowHeaders?: boolean;
  /** Figures in tabular digits, kept on one line. */
  numeric?: boolean;
  /** A page's main table: as tall as its rows, so the page scrolls rather than the box. */
  full?: boolean;
}

/** A compact table of data that scrolls in its own box, which the keyboard can reach. */
export function ScrollTable({
  caption,
  columns,
  rows,
  rowHeaders,
  numeric,
  full,
}: ScrollTableProps) {
  return (
    <Box
      className={full ? 'sl-scroll-table sl-scroll-table-full' : 'sl-scroll-table'}
      tabIndex={0}
      role="region"
      aria-label={caption}
    >
      <Table.Root size="1" variant="surface">
        <VisuallyHidden asChild>
          <caption>{caption}</caption>
        </VisuallyHidden>
        <Table.Header>
          <Table.Row>
            {columns.map((column, index) => (
              <Table.ColumnHeaderCell key={index}>{column}</Table.ColumnHeaderCell>
            ))}
          </Table.Row>
        </Table.Header>
        <Table.Body>
          {rows.map((row, index) => (
            <Table.Row key={index}>
              {row.map((cell, column) =>
                rowHeaders && column === 0 ? (
                  <Table.RowHeaderCell key={column}>{cell}</Table.RowHeaderCell>
                ) : (
                  <Table.Cell key={column} className={numeric ? 'sl-number' : undefined}>
                    {cell}
                  </Table.Cell>
                ),
              )}
            </Table.Row>
          ))}
        </Table.Body>
      </Table.Root>
    </Box>
  );
}
