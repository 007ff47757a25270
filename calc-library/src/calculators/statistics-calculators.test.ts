import { linearRegression } from 'simple-statistics';
import jStat from 'jstat';
import { describe, expect, it } from 'vitest';
import { expectClose } from '../../test/expect-close.js';
import { runCalculator } from '../index.js';
import { createSeededRandom } from '../random/seeded-random.js';
import { standardNormalDeviate } from '../random/standard-normal-deviate.js';

function syntheticMonthly(slopePerYear: number, persistence: number, seed: number, years = 30) {
  const random = createSeededRandom(seed);
  let noise = 0;
  return Array.from({ length: years * 12 }, (_unused, index) => {
    noise = persistence * noise + 0.1 * standardNormalDeviate(random);
    return { t: 1990 + (index + 0.5) / 12, y: slopePerYear * (index / 12) + noise };
  });
}

describe('trend', () => {
  it('agrees with simple-statistics and jstat', () => {
    const series = syntheticMonthly(0.02, 0.6, 3);
    const result = runCalculator('trend', { series, seriesUnit: 'K' });
    // simple-statistics 7.12.1 linearRegression, general-purpose reference library
    const reference = linearRegression(series.map((point) => [point.t, point.y]));
    expectClose(result.outputs.slopePerDecade.value, reference.m * 10, { rel: 1e-9 });
    const neff = result.outputs.effectiveSampleSize.value;
    const r1 = result.outputs.lag1Autocorrelation.value;
    // Santer et al. 2008: n_eff = n (1 − r₁)/(1 + r₁)
    expectClose(neff, (series.length * (1 - r1)) / (1 + r1), { rel: 1e-12 });
    // jstat 1.9.6 studentt.inv at n_eff − 2 degrees of freedom, general-purpose reference library
    const halfWidth = jStat.studentt.inv(0.975, neff - 2) * result.outputs.standardError.value;
    expectClose(result.outputs.ciHigh.value - result.outputs.slopePerDecade.value, halfWidth, {
      rel: 1e-7,
    });
    expectClose(result.outputs.slopePerDecade.value - result.outputs.ciLow.value, halfWidth, {
      rel: 1e-7,
    });
    expect(result.outputs.n.value).toBe(360);
    expect(result.outputs.slopePerDecade.unit).toBe('K/decade');
    expect(
      result.outputs.startYearSensitivity.columns.find((column) => column.key === 'slope')?.unit,
    ).toBe('K/decade');
  });

  it('widens the interval for persistent noise', () => {
    const white = runCalculator('trend', { series: syntheticMonthly(0.02, 0, 5) });
    const red = runCalculator('trend', { series: syntheticMonthly(0.02, 0.8, 5) });
    expect(red.outputs.lag1Autocorrelation.value).toBeGreaterThan(0.6);
    expect(red.outputs.effectiveSampleSize.value).toBeLessThan(
      white.outputs.effectiveSampleSize.value,
    );
    expect(red.outputs.ciHigh.value - red.outputs.ciLow.value).toBeGreaterThan(
      white.outputs.ciHigh.value - white.outputs.ciLow.value,
    );
  });

  it('uses only the points between from and to', () => {
    const series = syntheticMonthly(0.02, 0.3, 8);
    const part = runCalculator('trend', { series, from: 2000, to: 2010 });
    const inside = series.filter((point) => point.t >= 2000 && point.t <= 2010);
    // simple-statistics 7.12.1 linearRegression, general-purpose reference library
    expectClose(
      part.outputs.slopePerDecade.value,
      linearRegression(inside.map((point) => [point.t, point.y])).m * 10,
      { rel: 1e-9 },
    );
    expect(part.outputs.n.value).toBe(inside.length);
  });

  it('shows how the trend depends on the start year', () => {
    const series = syntheticMonthly(0.02, 0.5, 11);
    const rows = runCalculator('trend', { series }).outputs.startYearSensitivity.value;
    expect(rows.length).toBeGreaterThan(10);
    // The series starts at 1990.04, so the first whole start year is 1991.
    expect(rows[0]?.start).toBe(1991);
    for (const row of rows) {
      expect(row.low).toBeLessThan(row.slope);
      expect(row.high).toBeGreaterThan(row.slope);
      const inside = series.filter((point) => point.t >= row.start);
      expect(row.n).toBe(inside.length);
    }
  });

  it('sorts unsorted input and warns about uneven spacing', () => {
    const series = syntheticMonthly(0.02, 0.3, 4);
    const shuffled = [...series].reverse();
    const sorted = runCalculator('trend', { series });
    const reversed = runCalculator('trend', { series: shuffled });
    expect(reversed.outputs.slopePerDecade.value).toBe(sorted.outputs.slopePerDecade.value);
    const uneven = runCalculator('trend', {
      series: series.filter((_point, index) => index % 7 !== 3),
    });
    expect(uneven.cautions.some((caution) => caution.includes('not evenly spaced'))).toBe(true);
  });
});

describe('pattern-compare', () => {
  it('finds the faster-warming series and tests the difference', () => {
    const night = syntheticMonthly(0.03, 0.4, 21);
    const day = syntheticMonthly(0.01, 0.4, 22);
    const result = runCalculator('pattern-compare', {
      series: [
        { name: 'night', points: night },
        { name: 'day', points: day },
      ],
      seriesUnit: 'K',
    });
    const [first, second] = result.outputs.seriesTrends.value;
    const [pair] = result.outputs.pairDifferences.value;
    if (first === undefined || second === undefined || pair === undefined)
      throw new Error('missing rows');
    const trendOfNight = runCalculator('trend', { series: night });
    expectClose(first.slopePerDecade, trendOfNight.outputs.slopePerDecade.value, { rel: 1e-12 });
    // Santer et al. 2008, eq. 12: difference b₁ − b₂ with s_d = √(s₁² + s₂²)
    expectClose(pair.difference, first.slopePerDecade - second.slopePerDecade, { rel: 1e-12 });
    expectClose(pair.standardError, Math.hypot(first.standardError, second.standardError), {
      rel: 1e-12,
    });
    expect(pair.fasterSeries).toBe('night');
    expect(pair.significant).toBe(true);
    expect(pair.direction).toBe('same');
    expect(result.outputs.summary.value).toMatch(/night changes faster than day/);
  });

  it('calls two draws of the same process not significantly different', () => {
    const first = syntheticMonthly(0.02, 0.5, 31);
    const second = syntheticMonthly(0.02, 0.5, 32);
    const third = syntheticMonthly(-0.02, 0.5, 33);
    const result = runCalculator('pattern-compare', {
      series: [
        { name: 'a', points: first },
        { name: 'b', points: second },
        { name: 'c', points: third },
      ],
    });
    const rows = result.outputs.pairDifferences.value;
    expect(rows).toHaveLength(3);
    expect(rows[0]?.significant).toBe(false);
    expect(rows[1]?.direction).toBe('opposite');
    expect(result.outputs.summary.value).toMatch(/opposite directions/);
  });
});

describe('worksheet', () => {
  it('evaluates lines and reports errors line by line', () => {
    const result = runCalculator('worksheet', { lines: 'x = 3 m\nx * 2\n1 kg + 1 m' });
    const rows = result.outputs.results.value;
    expect(rows.map((row) => row.ok)).toEqual([true, true, false]);
    expect(rows[1]).toMatchObject({ value: 6, unit: 'm' });
    expect(result.steps).toHaveLength(3);
  });
});
