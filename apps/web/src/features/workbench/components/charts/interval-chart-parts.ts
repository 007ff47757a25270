import { formatNumber } from '@skyledger/calc';
import { seriesColors } from '@/components/charts/chart-style';

/** A shaded 95 % interval behind a trend line, in the trend charts. */
export const intervalAreaStyle = {
  stroke: 'none',
  fill: seriesColors.result,
  fillOpacity: 0.18,
  isAnimationActive: false,
} as const;

/** A tooltip row: a number, or the two ends of a shaded interval. */
export function tooltipRow(value: unknown, name: unknown): [string, string] {
  const text = Array.isArray(value)
    ? value.map((end) => formatNumber(Number(end))).join(' to ')
    : formatNumber(Number(value));
  return [text, String(name)];
}
