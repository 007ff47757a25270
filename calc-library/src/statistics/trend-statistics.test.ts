import fc from 'fast-check';
import jStat from 'jstat';
import { linearRegression, quantileSorted } from 'simple-statistics';
import { describe, expect, it } from 'vitest';
import { expectCalcInputError } from '../../test/expect-calc-input-error.js';
import { expectClose } from '../../test/expect-close.js';
import { createSeededRandom } from '../random/seeded-random.js';
import { standardNormalDeviate } from '../random/standard-normal-deviate.js';
import { autocorrelationAdjustedTrend } from './autocorrelation-adjusted-trend.js';
import { effectiveSampleSize } from './effective-sample-size.js';
import { lag1Autocorrelation } from './lag1-autocorrelation.js';
import { leastSquaresResiduals, ordinaryLeastSquares } from './ordinary-least-squares.js';
import { percentileOfSorted } from './percentile-of-sorted.js';
import { trendDifference } from './trend-difference.js';

const pointArbitrary = fc.array(fc.double({ min: -5, max: 5, noNaN: true }), {
  minLength: 5,
  maxLength: 200,
});

function yearlyTimes(count: number, start = 1979): number[] {
  return Array.from({ length: count }, (_unused, index) => start + index);
}

describe('ordinaryLeastSquares', () => {
  it('agrees with simple-statistics linearRegression', () => {
    fc.assert(
      fc.property(pointArbitrary, fc.double({ min: -1, max: 1, noNaN: true }), (noise, trend) => {
        const times = yearlyTimes(noise.length, 1900);
        const values = noise.map((value, index) => value + trend * index);
        const line = ordinaryLeastSquares(times, values);
        // simple-statistics 7.12.1 linearRegression, general-purpose reference library
        const reference = linearRegression(times.map((time, index) => [time, values[index] ?? 0]));
        expectClose(line.slope, reference.m, { rel: 1e-9, abs: 1e-11 });
        expectClose(line.intercept, reference.b, { rel: 1e-9, abs: 1e-7 });
      }),
    );
  });

  it('gives the standard error jstat’s OLS model gives', () => {
    fc.assert(
      fc.property(pointArbitrary, (noise) => {
        const times = yearlyTimes(noise.length);
        const values = noise.map((value, index) => value + 0.02 * index);
        const line = ordinaryLeastSquares(times, values);
        const standardError = Math.sqrt(
          line.sumSquaredResiduals / (line.count - 2) / line.sumSquaredTimeDeviations,
        );
        // jstat 1.9.6 models.ols, general-purpose reference library: standard error of the slope
        const model = jStat.models.ols(
          values,
          times.map((time) => [1, time - 1979]),
        );
        expectClose(standardError, model.t.se[1] ?? Number.NaN, { rel: 1e-7, abs: 1e-12 });
      }),
    );
  });

  it('refuses fewer than two points or a single time', () => {
    expectCalcInputError(() => ordinaryLeastSquares([1], [1]), 'series', /at least 2/);
    expectCalcInputError(
      () => ordinaryLeastSquares([1, 1, 1], [1, 2, 3]),
      'series',
      /different times/,
    );
  });
});

describe('lag1Autocorrelation', () => {
  it('gives the hand-computed values', () => {
    // hand computation: (1·1 + 1·(−1) + (−1)·(−1)) / 4 = 0.25
    expectClose(lag1Autocorrelation([1, 1, -1, -1]), 0.25, { rel: 1e-15 });
    // hand computation: (−1 −1 −1) / 4 = −0.75
    expectClose(lag1Autocorrelation([1, -1, 1, -1]), -0.75, { rel: 1e-15 });
    expect(lag1Autocorrelation([0, 0, 0])).toBe(0);
  });

  it('recovers the coefficient of a long AR(1) series', () => {
    const random = createSeededRandom(42);
    const series: number[] = [];
    let value = 0;
    for (let index = 0; index < 20000; index += 1) {
      value = 0.6 * value + standardNormalDeviate(random);
      series.push(value);
    }
    // common practice, no source: for AR(1) with φ = 0.6 and n = 20 000, r₁ is within about ±0.02 of φ
    expectClose(
      lag1Autocorrelation(leastSquaresResiduals(yearlyTimes(series.length), series)),
      0.6,
      { abs: 0.02 },
    );
  });
});

describe('effectiveSampleSize', () => {
  it('follows Santer et al. (2008)', () => {
    // Santer et al. 2008, Int. J. Climatol. 28, 1703: n_eff = n (1 − r₁)/(1 + r₁)
    expectClose(effectiveSampleSize(100, 0.5), (100 * 0.5) / 1.5, { rel: 1e-15 });
    expect(effectiveSampleSize(100, -0.3)).toBe(100);
  });
});

describe('autocorrelationAdjustedTrend', () => {
  it('equals the plain least-squares interval of jstat when r₁ ≤ 0', () => {
    // Residuals that alternate in sign have negative r₁, so n_eff is capped at n and the
    // interval is the ordinary one at n − 2 degrees of freedom.
    const times = yearlyTimes(30);
    const values = times.map(
      (_time, index) => 0.02 * index + (index % 2 === 0 ? 0.1 : -0.1) + 0.01 * Math.sin(index),
    );
    const trend = autocorrelationAdjustedTrend(times, values);
    expect(trend.lag1Autocorrelation).toBeLessThan(0);
    // jstat 1.9.6 models.ols interval95, general-purpose reference library
    const model = jStat.models.ols(
      values,
      times.map((time) => [1, time]),
    );
    const [low, high] = model.t.interval95[1] ?? [Number.NaN, Number.NaN];
    expectClose(trend.low, low, { rel: 1e-6 });
    expectClose(trend.high, high, { rel: 1e-6 });
  });

  it('inflates the standard error by √((n − 2)/(n_eff − 2))', () => {
    const random = createSeededRandom(7);
    const times = yearlyTimes(60);
    let persistent = 0;
    const values = times.map((_time, index) => {
      persistent = 0.7 * persistent + standardNormalDeviate(random) * 0.1;
      return 0.02 * index + persistent;
    });
    const trend = autocorrelationAdjustedTrend(times, values);
    expect(trend.lag1Autocorrelation).toBeGreaterThan(0);
    const expectedNeff = (60 * (1 - trend.lag1Autocorrelation)) / (1 + trend.lag1Autocorrelation);
    // Santer et al. 2008: n_eff = n (1 − r₁)/(1 + r₁), s_b inflated by √((n − 2)/(n_eff − 2))
    expectClose(trend.effectiveSampleSize, expectedNeff, { rel: 1e-12 });
    expectClose(
      trend.standardError,
      trend.ordinaryStandardError * Math.sqrt(58 / (expectedNeff - 2)),
      { rel: 1e-12 },
    );
    // jstat 1.9.6 studentt.inv at the fractional ν = n_eff − 2
    expectClose(trend.criticalT, jStat.studentt.inv(0.975, expectedNeff - 2), { rel: 1e-7 });
    expect(trend.low).toBeLessThan(trend.slope);
    expect(trend.high).toBeGreaterThan(trend.slope);
  });

  it('refuses a series too short or too autocorrelated for an interval', () => {
    expectCalcInputError(
      () => autocorrelationAdjustedTrend([1, 2], [1, 2]),
      'series',
      /at least 3 points/,
    );
    // One and a half slow waves and no noise leave residuals that follow each other:
    // r₁ ≈ 0.91, n_eff ≈ 1 for 20 points.
    const times = yearlyTimes(20);
    const values = times.map((_time, index) => Math.sin((3 * Math.PI * (index + 1)) / 21));
    expectCalcInputError(() => autocorrelationAdjustedTrend(times, values), 'series', /n_eff/);
  });
});

describe('trendDifference', () => {
  it('combines the standard errors in quadrature and the degrees of freedom by Welch–Satterthwaite', () => {
    const difference = trendDifference(
      { slope: 0.3, standardError: 0.03, degreesOfFreedom: 20 },
      { slope: 0.2, standardError: 0.04, degreesOfFreedom: 30 },
    );
    // Santer et al. 2008, eq. 12: d = (b₁ − b₂)/√(s₁² + s₂²)
    expectClose(difference.standardError, 0.05, { rel: 1e-12 });
    expectClose(difference.testStatistic, 2, { rel: 1e-12 });
    // Satterthwaite 1946: ν = (s₁² + s₂²)² / (s₁⁴/ν₁ + s₂⁴/ν₂)
    expectClose(difference.degreesOfFreedom, 0.05 ** 4 / (0.03 ** 4 / 20 + 0.04 ** 4 / 30), {
      rel: 1e-12,
    });
    // jstat 1.9.6 studentt.cdf for the two-sided p value
    expectClose(difference.pValue, 2 * (1 - jStat.studentt.cdf(2, difference.degreesOfFreedom)), {
      abs: 1e-7,
    });
  });

  it('is antisymmetric and calls equal trends not significant', () => {
    const first = { slope: 0.25, standardError: 0.05, degreesOfFreedom: 12 };
    const second = { slope: 0.1, standardError: 0.02, degreesOfFreedom: 40 };
    const forward = trendDifference(first, second);
    const backward = trendDifference(second, first);
    expectClose(forward.difference, -backward.difference, { rel: 1e-15 });
    expectClose(forward.pValue, backward.pValue, { rel: 1e-12 });
    expect(trendDifference(first, first).significant).toBe(false);
  });
});

describe('percentileOfSorted', () => {
  it('agrees with simple-statistics quantileSorted', () => {
    fc.assert(
      fc.property(
        fc.array(fc.double({ min: -1e6, max: 1e6, noNaN: true }), { minLength: 1, maxLength: 300 }),
        fc.double({ min: 0, max: 1, noNaN: true }),
        (values, probability) => {
          const sorted = [...values].sort((first, second) => first - second);
          // simple-statistics 7.12.1 quantileSorted (type 7), general-purpose reference library
          expectClose(
            percentileOfSorted(sorted, probability),
            quantileSorted(sorted, probability),
            { rel: 1e-12, abs: 1e-9 },
          );
        },
      ),
    );
  });

  it('refuses an empty list', () => {
    expectCalcInputError(() => percentileOfSorted([], 0.5), 'values');
  });
});
