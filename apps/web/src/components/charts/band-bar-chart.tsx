import { formatNumber } from '@skyledger/calc';
import {
  Bar,
  BarChart,
  CartesianGrid,
  Cell,
  ErrorBar,
  ReferenceLine,
  Tooltip,
  XAxis,
  YAxis,
} from 'recharts';
import { axisStyle, chartFrame, gridStyle, seriesColors } from './chart-style';

export interface BandBar {
  label: string;
  value: number;
  /** Ends of an error bar: a 5th–95th percentile band, or a 95 % interval. */
  low?: number;
  high?: number;
  color?: string;
}

interface BandBarChartProps {
  bars: readonly BandBar[];
  /** The unit as readers write it, for the axis and the tooltip. */
  unit: string;
  /** Bars along the page (labels down the left), for long labels and many levels. */
  horizontal?: boolean;
  /** Logarithmic value axis, for values that differ by orders of magnitude (all above 0). */
  log?: boolean;
  reference?: { value: number; label: string };
  /** Where a linear value axis starts and ends, when zero would squash the differences. */
  domain?: [number, number | 'auto'];
  height?: number;
}

/** True when bars differ by a factor of ten or more and all lie above zero: a log scale. */
export function wantsLogScale(bars: readonly BandBar[]): boolean {
  const values = bars.flatMap((bar) => [bar.value, bar.low ?? bar.value, bar.high ?? bar.value]);
  return values.every((value) => value > 0) && Math.max(...values) / Math.min(...values) >= 10;
}

const shown = (value: number, unit: string) => `${formatNumber(value)}${unit ? ` ${unit}` : ''}`;

/**
 * Labelled bars, each with its error bar when it has a band: the drawing behind the
 * workbench's budgets, forcings and comparisons. Its text alternative and table come
 * from the figure around it.
 */
export function BandBarChart({
  bars,
  unit,
  horizontal = false,
  log = false,
  reference,
  domain,
  height = 260,
}: BandBarChartProps) {
  const data = bars.map((bar) => ({
    label: bar.label,
    value: bar.value,
    // Recharts draws an error bar from the value down by the first and up by the second.
    error:
      bar.low === undefined || bar.high === undefined
        ? undefined
        : [Math.max(0, bar.value - bar.low), Math.max(0, bar.high - bar.value)],
    color: bar.color ?? seriesColors.result,
  }));
  const values = bars.flatMap((bar) => [bar.value, bar.low ?? bar.value, bar.high ?? bar.value]);
  // A log axis marked at whole powers of ten, so each step is ten times the last; the
  // lowest sits a little below the smallest bar, which would otherwise have no length.
  const lowestPower = Math.floor(Math.log10(Math.min(...values)) - 0.1);
  const highestPower = Math.ceil(Math.log10(Math.max(...values)) + 0.05);
  const decades = log
    ? Array.from(
        { length: highestPower - lowestPower + 1 },
        (_, index) => 10 ** (lowestPower + index),
      )
    : [];
  const valueAxis = {
    type: 'number' as const,
    tickFormatter: (value: number) => formatNumber(value, 3),
    ...axisStyle,
    ...(log
      ? {
          scale: 'log' as const,
          domain: [decades[0] ?? 1, decades[decades.length - 1] ?? 10],
          ticks: decades,
          allowDataOverflow: true,
        }
      : { domain: domain ?? ([Math.min(0, ...values), 'auto'] as [number, 'auto']) }),
  };
  const categoryAxis = { type: 'category' as const, dataKey: 'label', ...axisStyle };
  return (
    <BarChart
      data={data}
      layout={horizontal ? 'vertical' : 'horizontal'}
      {...chartFrame(height, reference ? 28 : 12)}
    >
      <CartesianGrid {...gridStyle} />
      {horizontal ? (
        <>
          <XAxis {...valueAxis} />
          <YAxis {...categoryAxis} width="auto" />
        </>
      ) : (
        <>
          <XAxis {...categoryAxis} interval={0} />
          <YAxis {...valueAxis} width="auto" />
        </>
      )}
      <Tooltip formatter={(value) => [shown(Number(value), unit), '']} separator="" />
      {reference ? (
        <ReferenceLine
          {...(horizontal ? { x: reference.value } : { y: reference.value })}
          stroke={seriesColors.reference}
          strokeDasharray="6 3"
          label={{ value: reference.label, fill: 'var(--gray-12)', fontSize: 12, position: 'top' }}
        />
      ) : null}
      <Bar dataKey="value" isAnimationActive={false} maxBarSize={56}>
        {data.map((entry) => (
          <Cell key={entry.label} fill={entry.color} />
        ))}
        <ErrorBar dataKey="error" width={8} strokeWidth={2} stroke="var(--gray-12)" />
      </Bar>
    </BarChart>
  );
}
