import type { DatasetSeriesRef } from '@skyledger/contracts';
import { formatDecimalYear } from '@/features/datasets/decimal-year';

/** One series a working read: its name, its span, and the dataset column it came from. */
export interface SeriesShown {
  name: string | null;
  span: string;
  ref: DatasetSeriesRef | null;
}

function pointsOf(value: unknown): { t: number }[] {
  return Array.isArray(value)
    ? value.filter((point): point is { t: number } => typeof point?.t === 'number')
    : [];
}

function spanOf(points: { t: number }[]): string {
  if (points.length === 0) return 'no points';
  const times = points.map((point) => point.t);
  const [first, last] = [Math.min(...times), Math.max(...times)];
  return points.length === 1
    ? `1 point, at ${formatDecimalYear(first)}`
    : `${points.length} points, ${formatDecimalYear(first)} to ${formatDecimalYear(last)}`;
}

/**
 * The series of a `series` or `seriesList` input as stored (the points themselves),
 * each matched with the dataset column it was read from, where it was.
 */
export function seriesShown(value: unknown, refs: readonly DatasetSeriesRef[]): SeriesShown[] {
  const list = Array.isArray(value) && value.some((item) => Array.isArray(item?.points));
  if (!list) return [{ name: null, span: spanOf(pointsOf(value)), ref: refs[0] ?? null }];
  const items = value as { name?: unknown; points?: unknown }[];
  // Refs are kept in the order of the list's dataset items; when all were, they pair up.
  const paired = refs.length === items.length;
  return items.map((item, index) => ({
    name: typeof item.name === 'string' ? item.name : null,
    span: spanOf(pointsOf(item.points)),
    ref: paired ? refs[index]! : null,
  }));
}
