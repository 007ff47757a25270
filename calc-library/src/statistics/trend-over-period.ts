import { CalcInputError } from '../errors/calc-input-error.js';
import {
  type AdjustedTrend,
  autocorrelationAdjustedTrend,
} from './autocorrelation-adjusted-trend.js';

/** Times and values of a series, as parallel arrays sorted by time. */
export interface SeriesArrays {
  readonly times: Float64Array;
  readonly values: Float64Array;
}

/**
 * First index with times[index] ≥ time, in times sorted ascending (binary search).
 *
 * @example
 * firstIndexAtOrAfter(Float64Array.of(1, 2, 3), 2) // => 1
 */
export function firstIndexAtOrAfter(times: Float64Array, time: number): number {
  let low = 0;
  let high = times.length;
  while (low < high) {
    const middle = (low + high) >>> 1;
    if ((times[middle] ?? 0) < time) low = middle + 1;
    else high = middle;
  }
  return low;
}

/**
 * The points of a series between two times (both included), as an index range.
 *
 * @param series times sorted ascending, with their values
 * @param from first time included (−∞ if undefined)
 * @param to last time included (+∞ if undefined)
 * @returns [start, end) indices into the series
 */
export function indexRangeOfPeriod(
  series: SeriesArrays,
  from: number | undefined,
  to: number | undefined,
): { start: number; end: number } {
  const start = from === undefined ? 0 : firstIndexAtOrAfter(series.times, from);
  const end =
    to === undefined
      ? series.times.length
      : firstIndexAtOrAfter(series.times, to + Number.EPSILON * Math.max(1, Math.abs(to)));
  return { start, end };
}

/**
 * The autocorrelation-adjusted trend of a series over [from, to], with an error naming the
 * input when the period holds too few points.
 *
 * @throws {CalcInputError} when the period holds fewer than 3 points or n_eff ≤ 2
 */
export function trendOverPeriod(
  series: SeriesArrays,
  from: number | undefined,
  to: number | undefined,
  field: string,
  label: string,
  where = 'trend',
): AdjustedTrend {
  const { start, end } = indexRangeOfPeriod(series, from, to);
  const count = end - start;
  if (count < 3) {
    throw new CalcInputError(
      field,
      `${label} needs at least 3 points between from and to for a trend (has ${Math.max(0, count)})`,
      where,
    );
  }
  return autocorrelationAdjustedTrend(series.times, series.values, start, end, 0.95, field);
}
