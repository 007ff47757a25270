import { uniformFloat64 } from 'pure-rand/distribution/uniformFloat64';
import { xoroshiro128plus } from 'pure-rand/generator/xoroshiro128plus';

/** Standard normal draws from a seeded xoroshiro128+ (Box–Muller), the same on every run. */
export function normalDraws(seed: number): () => number {
  const generator = xoroshiro128plus(seed);
  return () => {
    const u = 1 - uniformFloat64(generator);
    const v = uniformFloat64(generator);
    return Math.sqrt(-2 * Math.log(u)) * Math.cos(2 * Math.PI * v);
  };
}

export interface SyntheticSeries {
  /** Linear change per year, in the series' unit. */
  slopePerYear: number;
  /** Standard deviation of the year-to-year noise. */
  noise: number;
  /** Lag-one autocorrelation of the noise (AR(1)), as real temperature records have. */
  autocorrelation: number;
  /** One-off additions by year: warm El Niño-like years, cool volcanic ones. */
  events?: Readonly<Record<number, number>>;
}

/**
 * Invented annual values, one per year from `firstYear` to `lastYear`: a line, AR(1)
 * noise, and events. For demo datasets only; every dataset made from it says so.
 */
export function syntheticValues(
  spec: SyntheticSeries,
  years: readonly number[],
  seed: number,
): number[] {
  const draw = normalDraws(seed);
  const scale = Math.sqrt(1 - spec.autocorrelation ** 2);
  let red = 0;
  return years.map((year, index) => {
    red = spec.autocorrelation * red + scale * spec.noise * draw();
    const value = spec.slopePerYear * index + red + (spec.events?.[year] ?? 0);
    return Math.round(value * 1000) / 1000;
  });
}

export function yearsFrom(first: number, last: number): number[] {
  return Array.from({ length: last - first + 1 }, (_, index) => first + index);
}

/** A CSV with a `year` column and one column per named series. */
export function toCsv(years: readonly number[], columns: Record<string, number[]>): string {
  const names = Object.keys(columns);
  const lines = years.map((year, row) =>
    [year, ...names.map((name) => columns[name]![row]!.toFixed(3))].join(','),
  );
  return [['year', ...names].join(','), ...lines].join('\n') + '\n';
}
