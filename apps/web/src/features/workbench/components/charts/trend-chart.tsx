import {
  displayUnit,
  formatNumber,
  type CalculatorResult,
  type SeriesPoint,
} from '@skyledger/calc';
import { Area, CartesianGrid, ComposedChart, Line, Tooltip, XAxis, YAxis } from 'recharts';
import { axisStyle, chartFrame, gridStyle, seriesColors } from '@/components/charts/chart-style';
import { ChartFigure } from '@/components/ui/chart-figure';
import { formatDecimalYear } from '@/features/datasets/decimal-year';
import { thinSeries } from '@/features/datasets/series-summary';
import { quantityText } from '@/features/workings/format-values';
import { intervalAreaStyle, tooltipRow } from './interval-chart-parts';

// More points than the chart can show apart; the table keeps them all.
const maxDrawnPoints = 1500;

const inPeriod = (t: number, from: number | undefined, to: number | undefined) =>
  (from === undefined || t >= from) && (to === undefined || t <= to);

/**
 * The series with its least-squares line over the chosen period and, around it, the fan
 * of the 95 % interval: the lowest and highest slopes of the interval, through the
 * period's mean point (where a fitted line always passes).
 */
export function TrendChart({ result }: { result: CalculatorResult<'trend'> }) {
  const points: readonly SeriesPoint[] = result.inputs.series ?? [];
  const from = typeof result.inputs.from === 'number' ? result.inputs.from : undefined;
  const to = typeof result.inputs.to === 'number' ? result.inputs.to : undefined;
  const { slopePerDecade, ciLow, ciHigh, n } = result.outputs;
  const unit = slopePerDecade.unit.replace(/\/decade$/, '');
  const shownUnit = unit === '1' ? '' : displayUnit(unit);
  const period = points.filter((point) => inPeriod(point.t, from, to));
  const meanT = period.reduce((sum, point) => sum + point.t, 0) / period.length;
  const meanY = period.reduce((sum, point) => sum + point.y, 0) / period.length;
  const lineAt = (perDecade: number, t: number) => meanY + (perDecade / 10) * (t - meanT);
  const rows = points.map((point) => {
    const inside = inPeriod(point.t, from, to);
    const ends = [lineAt(ciLow.value, point.t), lineAt(ciHigh.value, point.t)];
    return {
      t: point.t,
      y: inside ? point.y : undefined,
      outside: inside ? undefined : point.y,
      fit: inside ? lineAt(slopePerDecade.value, point.t) : undefined,
      fan: inside ? [Math.min(...ends), Math.max(...ends)] : undefined,
    };
  });
  const drawn = thinSeries(rows, maxDrawnPoints);
  const first = period[0]?.t ?? 0;
  const last = period[period.length - 1]?.t ?? 0;
  const includesZero = ciLow.value <= 0 && ciHigh.value >= 0;
  const perDecade = (value: number) => quantityText(value, slopePerDecade.unit);
  return (
    <ChartFigure
      title={`The series and its trend${shownUnit ? ` (${shownUnit})` : ''}`}
      summary={
        `From ${formatDecimalYear(first)} to ${formatDecimalYear(last)} (${n.value} points) the trend is ` +
        `${perDecade(slopePerDecade.value)}, with a 95 % interval from ${perDecade(ciLow.value)} to ${perDecade(ciHigh.value)}` +
        (includesZero
          ? ': the interval includes no change at all, so this period alone cannot tell a trend from noise.'
          : '.') +
        (points.length > period.length
          ? ` The ${points.length - period.length} points outside the period are drawn faint.`
          : '') +
        ' The shaded fan spans the slopes of the interval.'
      }
      chart={
        <ComposedChart data={drawn} {...chartFrame(280)}>
          <CartesianGrid {...gridStyle} />
          <XAxis
            dataKey="t"
            type="number"
            domain={['dataMin', 'dataMax']}
            tickFormatter={(t: number) => String(Math.round(t))}
            {...axisStyle}
          />
          <YAxis width="auto" tickFormatter={(y: number) => formatNumber(y, 3)} {...axisStyle} />
          <Tooltip labelFormatter={(t) => formatDecimalYear(Number(t))} formatter={tooltipRow} />
          <Area dataKey="fan" name="95 % interval of the slope" {...intervalAreaStyle} />
          <Line
            dataKey="outside"
            name="Outside the period"
            stroke={seriesColors.faint}
            dot={{ r: 2 }}
            isAnimationActive={false}
          />
          <Line
            dataKey="y"
            name="Value"
            stroke="var(--gray-11)"
            strokeWidth={1.25}
            dot={drawn.length <= 120 ? { r: 2 } : false}
            isAnimationActive={false}
          />
          <Line
            dataKey="fit"
            name="Trend"
            stroke={seriesColors.result}
            strokeWidth={2.5}
            dot={false}
            isAnimationActive={false}
          />
        </ComposedChart>
      }
      table={{
        columns: [
          'Time',
          `Value${shownUnit ? ` (${shownUnit})` : ''}`,
          'Trend line',
          'In the period',
        ],
        rows: rows.map((row) => [
          formatDecimalYear(row.t),
          formatNumber(row.y ?? row.outside ?? Number.NaN),
          row.fit === undefined ? '—' : formatNumber(row.fit),
          row.fit === undefined ? 'no' : 'yes',
        ]),
      }}
    />
  );
}
