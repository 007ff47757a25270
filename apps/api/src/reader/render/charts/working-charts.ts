import { displayUnit, formatNumber } from '@skyledger/calc';
import { type ReaderWorking, type ReaderWorkingOutput } from '@skyledger/contracts';
import { quantityText } from '../format.js';
import { wantsLogScale } from './chart-scale.js';

/** One labelled value of a chart, with the ends of its band or interval when it has one. */
export interface ChartRow {
  label: string;
  value: number;
  low?: number;
  high?: number;
  /** Drawn in the reference colour: what the other rows are set against. */
  reference?: boolean;
  /** The row's own unit, on a chart whose rows each have their own axis. */
  unit?: string;
}

export interface ChartTable {
  columns: string[];
  rows: string[][];
}

interface ChartBase {
  title: string;
  /** The text alternative: what the picture shows, in words. */
  summary: string;
  /** The chart's numbers, shown beside it. */
  table: ChartTable;
  /** The table output this chart shows whole (its table is not repeated in the results). */
  tableOutput?: string;
}

/** Values with their bands or intervals, a dot at the middle. */
export interface RangesChart extends ChartBase {
  kind: 'ranges';
  unit: string;
  rows: ChartRow[];
  log: boolean;
  /** One axis for every row (one unit), or an axis under each row. */
  sharedAxis: boolean;
}

/** Bars from zero (or from the axis floor on a log scale). */
export interface BarsChart extends ChartBase {
  kind: 'bars';
  unit: string;
  rows: ChartRow[];
  log: boolean;
}

/** A series along a numeric axis, with its interval as a shaded area when it has one. */
export interface LineChart extends ChartBase {
  kind: 'line';
  xLabel: string;
  unit: string;
  points: Array<{ x: number; y: number; low?: number; high?: number }>;
}

export type WorkingChart = RangesChart | BarsChart | LineChart;

const logNote = ' The scale is logarithmic: each mark is ten times the one before it.';
const percentileName = '5th–95th percentile range';
const intervalName = '95 % interval';

const cell = (value: unknown): string =>
  typeof value === 'number'
    ? formatNumber(value)
    : typeof value === 'boolean'
      ? value
        ? 'yes'
        : 'no'
      : value === null || value === undefined
        ? '—'
        : String(value);

const withUnit = (label: string, unit: string) =>
  unit ? `${label} (${displayUnit(unit)})` : label;

const rowValues = (rows: readonly ChartRow[]) =>
  rows.flatMap((row) => [row.value, row.low ?? row.value, row.high ?? row.value]);

function rowSentence(row: ChartRow, unit: string, bandName: string): string {
  const value = quantityText(row.value, unit);
  return row.low === undefined || row.high === undefined
    ? `${row.label}: ${value}`
    : `${row.label}: ${value} (${bandName} ${quantityText(row.low, unit)} to ${quantityText(row.high, unit)})`;
}

function rowsTable(rows: readonly ChartRow[], unit: string, labelColumn: string): ChartTable {
  const banded = rows.some((row) => row.low !== undefined);
  return {
    columns: [
      labelColumn,
      withUnit('Value', unit),
      ...(banded ? [withUnit('Low end', unit), withUnit('High end', unit)] : []),
    ],
    rows: rows.map((row) => [
      row.label,
      formatNumber(row.value),
      ...(banded ? [cell(row.low), cell(row.high)] : []),
    ]),
  };
}

/**
 * Number outputs with a Monte Carlo band, in one chart: each on an axis of its own, since
 * their units differ, so the chart shows how wide and how lopsided each band is.
 */
function bandChart(outputs: readonly ReaderWorkingOutput[]): RangesChart | null {
  const rows: ChartRow[] = outputs.flatMap((output) =>
    output.kind === 'number' && output.band
      ? [
          {
            label: output.label,
            unit: output.unit,
            value: output.band.p50,
            low: output.band.p5,
            high: output.band.p95,
          },
        ]
      : [],
  );
  if (rows.length === 0) return null;
  const log = rows.some((row) => wantsLogScale(rowValues([row])));
  const quantity = (value: number | undefined, unit = '') =>
    value === undefined ? '—' : quantityText(value, unit);
  return {
    kind: 'ranges',
    title: `Uncertainty of the results: median and ${percentileName}`,
    summary:
      rows.map((row) => rowSentence(row, row.unit ?? '', percentileName)).join('. ') +
      '. The dot marks the median; the line runs from the 5th to the 95th percentile.' +
      (log ? logNote : ''),
    table: {
      columns: ['Result', '5th percentile', 'Median', '95th percentile'],
      rows: rows.map((row) => [
        row.label,
        quantity(row.low, row.unit),
        quantity(row.value, row.unit),
        quantity(row.high, row.unit),
      ]),
    },
    unit: '',
    rows,
    log,
    sharedAxis: false,
  };
}

/**
 * Comparisons the calculators draw with a reference value: the reference is the result
 * divided by its ratio to it, so it matches the result's unit exactly.
 */
const comparisons: Record<string, { output: string; label: string; reference: string }> = {
  'heat-flux-compare': { output: 'flux', label: 'Heat flow', reference: 'Reference flux' },
  'solar-change': {
    output: 'totalForcing',
    label: 'Change of absorbed sunlight',
    reference: 'Greenhouse forcing',
  },
};

function comparisonChart(working: ReaderWorking): BarsChart | null {
  const comparison = comparisons[working.calculatorId];
  if (!comparison) return null;
  const output = working.outputs.find((candidate) => candidate.name === comparison.output);
  const ratio = working.outputs.find((candidate) => candidate.name === 'ratioToReference');
  if (output?.kind !== 'number' || ratio?.kind !== 'number') return null;
  const value = output.value as number;
  const ratioValue = ratio.value as number;
  if (!Number.isFinite(ratioValue) || ratioValue === 0) return null;
  const rows: ChartRow[] = [
    output.band
      ? {
          label: comparison.label,
          value: output.band.p50,
          low: output.band.p5,
          high: output.band.p95,
        }
      : { label: comparison.label, value },
    { label: comparison.reference, value: value / ratioValue, reference: true },
  ];
  const log = wantsLogScale(rowValues(rows));
  return {
    kind: 'bars',
    title: withUnit(
      `${comparison.label} against the ${comparison.reference.toLowerCase()}`,
      output.unit,
    ),
    summary:
      rows.map((row) => rowSentence(row, output.unit, percentileName)).join('. ') +
      `. The first is ${formatNumber(ratioValue, 3)} times the second.` +
      (log ? logNote : ''),
    table: rowsTable(rows, output.unit, 'Quantity'),
    unit: output.unit,
    rows,
    log,
  };
}

/** A list output (e.g. layer temperatures) as one bar per item. */
function listChart(output: ReaderWorkingOutput): BarsChart | null {
  const values = Array.isArray(output.value) ? (output.value as unknown[]) : [];
  if (values.length < 2 || !values.every((value) => typeof value === 'number')) return null;
  const rows = (values as number[]).map((value, index) => ({ label: `${index + 1}`, value }));
  const log = wantsLogScale(rowValues(rows));
  return {
    kind: 'bars',
    title: withUnit(output.label, output.unit),
    summary:
      `${output.label}, in order: ` +
      rows.map((row) => quantityText(row.value, output.unit)).join(', ') +
      '.' +
      (log ? logNote : ''),
    table: rowsTable(rows, output.unit, 'Item'),
    unit: output.unit,
    rows,
    log,
  };
}

type Row = Record<string, unknown>;

/** The keys of a table's interval columns ("low"/"high" or "ciLow"/"ciHigh"), if any. */
function intervalKeys(columns: ReadonlyArray<{ key: string }>): [string, string] | null {
  const low = columns.find((column) => /^(ci)?low$/i.test(column.key));
  const high = columns.find((column) => /^(ci)?high$/i.test(column.key));
  return low && high ? [low.key, high.key] : null;
}

function fullTable(output: ReaderWorkingOutput, rows: readonly Row[]): ChartTable {
  const columns = output.columns ?? [];
  return {
    columns: columns.map((column) =>
      column.unit && column.unit !== 'year' ? withUnit(column.label, column.unit) : column.label,
    ),
    rows: rows.map((row) => columns.map((column) => cell(row[column.key]))),
  };
}

/**
 * A table output as a chart: rows along a year (the trend's start-year table) as a line;
 * rows named by text with a value and its interval (pattern-compare's trends and
 * differences) as ranges. Other tables stay tables.
 */
function tableChart(output: ReaderWorkingOutput): WorkingChart | null {
  const columns = output.columns ?? [];
  const rows = (Array.isArray(output.value) ? output.value : []) as Row[];
  const [first] = columns;
  if (!first || rows.length === 0) return null;
  const interval = intervalKeys(columns);
  const numeric = columns.filter(
    (column) =>
      column !== first &&
      !interval?.includes(column.key) &&
      rows.every((row) => typeof row[column.key] === 'number'),
  );
  const valueColumn = numeric[0];
  if (!valueColumn) return null;
  const number = (row: Row, key: string) => row[key] as number;
  const table = fullTable(output, rows);
  if (
    first.unit === 'year' &&
    rows.length > 1 &&
    rows.every((row) => typeof row[first.key] === 'number')
  ) {
    const points = rows.map((row) => ({
      x: number(row, first.key),
      y: number(row, valueColumn.key),
      ...(interval ? { low: number(row, interval[0]), high: number(row, interval[1]) } : {}),
    }));
    const lowest = points.reduce((best, point) => (point.y < best.y ? point : best));
    const highest = points.reduce((best, point) => (point.y > best.y ? point : best));
    const unit = valueColumn.unit;
    const spanningZero = interval
      ? points.filter((point) => (point.low ?? 0) <= 0 && (point.high ?? 0) >= 0).length
      : 0;
    return {
      kind: 'line',
      title: output.label,
      summary:
        `${valueColumn.label} for each ${first.label.toLowerCase()} from ${points[0]!.x} to ${points[points.length - 1]!.x}: ` +
        `lowest ${quantityText(lowest.y, unit)} (${lowest.x}), highest ${quantityText(highest.y, unit)} (${highest.x}).` +
        (interval
          ? ` The shaded area is the ${intervalName}; for ${spanningZero} of ${points.length} rows it includes zero.`
          : ''),
      table,
      tableOutput: output.name,
      xLabel: first.label,
      unit,
      points,
    };
  }
  const labelColumns = columns.filter((column) =>
    rows.every((row) => typeof row[column.key] === 'string'),
  );
  if (!interval || labelColumns.length === 0 || labelColumns[0] !== first) return null;
  const chartRows = rows.map((row) => ({
    // A pair's row is named by both of its series: "night − day".
    label: labelColumns
      .slice(0, 2)
      .filter((column) => columns.indexOf(column) < columns.indexOf(valueColumn))
      .map((column) => String(row[column.key]))
      .join(' − '),
    value: number(row, valueColumn.key),
    low: number(row, interval[0]),
    high: number(row, interval[1]),
  }));
  const unit = valueColumn.unit;
  return {
    kind: 'ranges',
    title: withUnit(`${output.label}, with the ${intervalName}`, unit),
    summary:
      chartRows.map((row) => rowSentence(row, unit, intervalName)).join('. ') +
      '. The dot marks the value; the line runs across its 95 % interval.',
    table,
    tableOutput: output.name,
    unit,
    rows: chartRows,
    log: false,
    sharedAxis: true,
  };
}

/** The charts of a working, in the order they are shown: comparisons, bands, lists, tables. */
export function workingCharts(working: ReaderWorking): WorkingChart[] {
  const charts: Array<WorkingChart | null> = [
    comparisonChart(working),
    bandChart(working.outputs),
    ...working.outputs.filter((output) => output.kind === 'list').map(listChart),
    ...working.outputs.filter((output) => output.kind === 'table').map(tableChart),
  ];
  return charts.filter((chart): chart is WorkingChart => chart !== null);
}
