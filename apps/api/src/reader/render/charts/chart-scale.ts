/** A value axis: where a value falls between two pixel positions, and where its ticks go. */
export interface ValueScale {
  at(value: number): number;
  ticks: number[];
  log: boolean;
  /** The lowest value on the axis: where bars start on a log scale. */
  floor: number;
}

/** Log scale when every value is above zero and they span more than two orders of magnitude. */
export function wantsLogScale(values: readonly number[]): boolean {
  if (values.length === 0 || values.some((value) => !(value > 0))) return false;
  return Math.max(...values) / Math.min(...values) > 100;
}

/** A round step giving about `count` steps over `span`: 1, 2 or 5 times a power of ten (as d3's ticks). */
function niceStep(span: number, count: number): number {
  const raw = span / count;
  const power = 10 ** Math.floor(Math.log10(raw));
  const factor = raw / power;
  return (
    power *
    (factor >= Math.sqrt(50) ? 10 : factor >= Math.sqrt(10) ? 5 : factor >= Math.sqrt(2) ? 2 : 1)
  );
}

/**
 * Maps values onto [start, end] pixels: linear with round ticks (from zero when
 * `includeZero`; the axis ends on round values unless `tight`, when it ends at the data),
 * or by powers of ten when `log`.
 */
export function valueScale(
  values: readonly number[],
  [start, end]: [number, number],
  {
    log = false,
    includeZero = false,
    tight = false,
  }: { log?: boolean; includeZero?: boolean; tight?: boolean } = {},
): ValueScale {
  const finite = values.filter(Number.isFinite);
  if (log) {
    const low = Math.floor(Math.log10(Math.min(...finite)));
    const high = Math.max(Math.ceil(Math.log10(Math.max(...finite))), low + 1);
    const ticks = Array.from({ length: high - low + 1 }, (_, index) => 10 ** (low + index));
    return {
      at: (value) => start + ((Math.log10(value) - low) / (high - low)) * (end - start),
      ticks,
      log,
      floor: 10 ** low,
    };
  }
  let min = Math.min(...finite, ...(includeZero ? [0] : []));
  let max = Math.max(...finite, ...(includeZero ? [0] : []));
  if (min === max) {
    const pad = Math.abs(min) * 0.1 || 1;
    min -= pad;
    max += pad;
  }
  const step = niceStep(max - min, 4);
  const [first, last] = tight
    ? [min, max]
    : [Math.floor(min / step) * step, Math.ceil(max / step) * step];
  const ticks: number[] = [];
  // Rounding to the step's precision keeps 0.30000000000000004 out of the labels.
  for (let tick = Math.ceil(first / step) * step; tick <= last + step * 1e-9; tick += step) {
    ticks.push(Number(tick.toPrecision(12)));
  }
  return {
    at: (value) => start + ((value - first) / (last - first)) * (end - start),
    ticks,
    log,
    floor: includeZero ? 0 : first,
  };
}
