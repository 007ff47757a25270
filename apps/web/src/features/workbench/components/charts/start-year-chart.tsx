import { formatNumber, type CalculatorResult } from '@skyledger/calc';
import {
  Area,
  CartesianGrid,
  ComposedChart,
  Line,
  ReferenceLine,
  Tooltip,
  XAxis,
  YAxis,
} from 'recharts';
import { axisStyle, chartFrame, gridStyle, seriesColors } from '@/components/charts/chart-style';
import { ChartFigure } from '@/components/ui/chart-figure';
import { quantityText } from '@/features/workings/format-values';
import { intervalAreaStyle, tooltipRow } from './interval-chart-parts';

/** How the trend to the same end changes with the year it starts from. */
export function StartYearChart({ result }: { result: CalculatorResult<'trend'> }) {
  const table = result.outputs.startYearSensitivity;
  const unit = result.outputs.slopePerDecade.unit;
  const rows = table.value.map((row) => ({ ...row, range: [row.low, row.high] }));
  if (rows.length < 2) return null;
  const from = typeof result.inputs.from === 'number' ? result.inputs.from : undefined;
  const steepest = rows.reduce((best, row) => (row.slope > best.slope ? row : best));
  const flattest = rows.reduce((best, row) => (row.slope < best.slope ? row : best));
  const spanningZero = rows.filter((row) => row.low <= 0 && row.high >= 0);
  const perDecade = (value: number) => quantityText(value, unit);
  const last = rows[rows.length - 1]!;
  return (
    <ChartFigure
      title="Trend by start year, to the same end"
      summary={
        `Started in any year from ${rows[0]!.start} to ${last.start}, the trend runs from ` +
        `${perDecade(flattest.slope)} (start ${flattest.start}) to ${perDecade(steepest.slope)} (start ${steepest.start}). ` +
        `${spanningZero.length} of ${rows.length} start years give a 95 % interval that includes no change` +
        (spanningZero.length > 0
          ? ` (the earliest such start: ${Math.min(...spanningZero.map((row) => row.start))}). Later starts leave fewer years, and so wider intervals.`
          : '.')
      }
      chart={
        <ComposedChart data={rows} {...chartFrame(260, 12)}>
          <CartesianGrid {...gridStyle} />
          <XAxis dataKey="start" type="number" domain={['dataMin', 'dataMax']} {...axisStyle} />
          <YAxis width="auto" tickFormatter={(y: number) => formatNumber(y, 3)} {...axisStyle} />
          <Tooltip formatter={tooltipRow} />
          <ReferenceLine
            y={0}
            stroke={seriesColors.reference}
            label={{
              value: 'no change',
              fill: 'var(--gray-12)',
              fontSize: 12,
              position: 'insideBottomLeft',
            }}
          />
          {from === undefined ? null : (
            <ReferenceLine x={from} stroke={seriesColors.reference} strokeDasharray="4 3" />
          )}
          <Area dataKey="range" name="95 % interval" {...intervalAreaStyle} />
          <Line
            dataKey="slope"
            name="Trend per decade"
            stroke={seriesColors.result}
            strokeWidth={2}
            dot={{ r: 2 }}
            isAnimationActive={false}
          />
        </ComposedChart>
      }
      table={{
        columns: table.columns.map((column) =>
          column.unit && column.unit !== 'year' ? `${column.label} (${column.unit})` : column.label,
        ),
        rows: table.value.map((row) => [
          String(row.start),
          formatNumber(row.slope),
          formatNumber(row.low),
          formatNumber(row.high),
          String(row.n),
        ]),
      }}
    />
  );
}
