import { type ReactNode } from 'react';

interface DataTableProps {
  caption: string;
  /** Show the caption, or keep it for screen readers only (when a heading says it). */
  captionHidden?: boolean;
  columns: readonly string[];
  rows: ReadonlyArray<readonly ReactNode[]>;
  /** Columns holding numbers: kept on one line, figures aligned. All but the first unless told. */
  numericColumns?: readonly number[];
}

/**
 * A table that scrolls sideways on a narrow screen rather than widening the page; the
 * scrolling box takes focus so a keyboard can scroll it. The first cell of a row heads it.
 */
export function DataTable({
  caption,
  captionHidden = false,
  columns,
  rows,
  numericColumns,
}: DataTableProps) {
  return (
    <div className="scroll" tabIndex={0} role="region" aria-label={caption}>
      <table>
        <caption className={captionHidden ? 'sr' : undefined}>{caption}</caption>
        <thead>
          <tr>
            {columns.map((column, index) => (
              <th key={index} scope="col">
                {column}
              </th>
            ))}
          </tr>
        </thead>
        <tbody>
          {rows.map((row, index) => (
            <tr key={index}>
              {row.map((value, column) =>
                column === 0 ? (
                  <th key={column} scope="row">
                    {value}
                  </th>
                ) : (
                  <td
                    key={column}
                    className={(numericColumns?.includes(column) ?? column > 0) ? 'n' : undefined}
                  >
                    {value}
                  </td>
                ),
              )}
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
