import { DATASET_MAX_ROWS, type DatasetValueColumn } from '@skyledger/contracts';
import { parse } from 'csv-parse/sync';
import { type DatasetColumnSpec, type DatasetRow } from './entities/dataset.entity';
import { parseDecimalYear } from './parse-time';

export interface RowProblem {
  /** The line of the file, counting the header as line 1. */
  line: number;
  column: string;
  problem: string;
}

export type ParsedDataset =
  | { ok: true; columns: DatasetColumnSpec[]; rows: DatasetRow[] }
  | { ok: false; problems: RowProblem[] };

interface CsvRecord {
  record: string[];
  info: { lines: number };
}

/** The header and records of a CSV text, each record with the line it starts on. */
export function readCsv(text: string): { header: string[]; records: CsvRecord[] } {
  const [head, ...records] = parse(text, {
    info: true,
    skip_empty_lines: true,
    trim: true,
    bom: true,
  }) as unknown as CsvRecord[];
  return { header: head?.record ?? [], records };
}

/**
 * Types every row of a dataset CSV: the time column as decimal years, each chosen value
 * column as numbers. All or nothing: any bad cell, a repeated time or too many rows is
 * reported by line, and no rows are returned.
 */
export function parseDatasetCsv(
  text: string,
  selection: { timeColumn: string; valueColumns: DatasetValueColumn[] },
): ParsedDataset {
  const { header, records } = readCsv(text);
  const problems: RowProblem[] = [];
  const indexOf = (column: string) => {
    const index = header.indexOf(column);
    if (index < 0) problems.push({ line: 1, column, problem: 'is not a column of the file' });
    return index;
  };
  const timeIndex = indexOf(selection.timeColumn);
  const valueIndexes = selection.valueColumns.map((column) => indexOf(column.column));
  if (problems.length) return { ok: false, problems };
  if (records.length === 0) {
    return { ok: false, problems: [{ line: 2, column: '', problem: 'the file has no rows' }] };
  }
  if (records.length > DATASET_MAX_ROWS) {
    return {
      ok: false,
      problems: [
        {
          line: DATASET_MAX_ROWS + 2,
          column: '',
          problem: `a dataset holds at most ${DATASET_MAX_ROWS} rows`,
        },
      ],
    };
  }

  const rows: DatasetRow[] = [];
  const lineOfTime = new Map<number, number>();
  for (const { record, info } of records) {
    const line = info.lines;
    const t = parseDecimalYear(record[timeIndex] ?? '');
    if (t === null) {
      problems.push({
        line,
        column: selection.timeColumn,
        problem: `"${record[timeIndex] ?? ''}" is not a year (1998, 1998.5) or a date (1998-07, 1998-07-15)`,
      });
    } else if (lineOfTime.has(t)) {
      problems.push({
        line,
        column: selection.timeColumn,
        problem: `repeats the time of line ${lineOfTime.get(t)}`,
      });
    } else {
      lineOfTime.set(t, line);
    }
    const values = valueIndexes.map((index, position) => {
      const cell = record[index] ?? '';
      const value = cell === '' ? Number.NaN : Number(cell);
      if (!Number.isFinite(value)) {
        problems.push({
          line,
          column: selection.valueColumns[position]!.column,
          problem: cell === '' ? 'is empty' : `"${cell}" is not a number`,
        });
      }
      return value;
    });
    if (t !== null) rows.push([t, ...values]);
  }
  if (problems.length) return { ok: false, problems };
  rows.sort((a, b) => a[0] - b[0]);
  return {
    ok: true,
    rows,
    columns: selection.valueColumns.map((column) => ({
      key: column.column,
      label: column.label ?? column.column,
      unit: column.unit,
    })),
  };
}
