import { displayUnit, formatQuantity } from '@skyledger/calc';
import { formatDecimalYear } from './decimal-year';

export interface SeriesPoint {
  t: number;
  y: number;
}

/**
 * A time series in one sentence, the text alternative of its chart: its span, its count,
 * where it is lowest and highest, and where it starts and ends.
 */
export function summariseSeries(label: string, unit: string, points: readonly SeriesPoint[]) {
  if (points.length === 0) return `${label}: no values.`;
  const shown = (y: number) => formatQuantity(y, displayUnit(unit));
  let low = points[0]!;
  let high = points[0]!;
  for (const point of points) {
    if (point.y < low.y) low = point;
    if (point.y > high.y) high = point;
  }
  const first = points[0]!;
  const last = points[points.length - 1]!;
  return (
    `${label} from ${formatDecimalYear(first.t)} to ${formatDecimalYear(last.t)}, ` +
    `${points.length} ${points.length === 1 ? 'value' : 'values'}: ` +
    `lowest ${shown(low.y)} (${formatDecimalYear(low.t)}), highest ${shown(high.y)} (${formatDecimalYear(high.t)}); ` +
    `first ${shown(first.y)}, last ${shown(last.y)}.`
  );
}

/** At most `max` points, evenly picked, the last always kept: enough to draw a long series. */
export function thinSeries<T>(points: readonly T[], max: number): readonly T[] {
  if (points.length <= max) return points;
  const stride = Math.ceil(points.length / max);
  const kept = points.filter((_, index) => index % stride === 0);
  if (kept[kept.length - 1] !== points[points.length - 1]) kept.push(points[points.length - 1]!);
  return kept;
}
