import { requirePositive } from '../errors/require-finite.js';
import { studentTCumulative, studentTQuantile } from './student-t-distribution.js';

/** Difference of two trends, each with its (adjusted) standard error and degrees of freedom. */
export interface TrendDifference {
  /** b₁ − b₂, in the trends' unit. */
  readonly difference: number;
  /** s_d = √(s₁² + s₂²). */
  readonly standardError: number;
  /** Welch–Satterthwaite degrees of freedom of s_d. */
  readonly degreesOfFreedom: number;
  /** d = (b₁ − b₂)/s_d. */
  readonly testStatistic: number;
  /** Two-sided p value of d against Student's t at the combined degrees of freedom. */
  readonly pValue: number;
  readonly low: number;
  readonly high: number;
  /** True when the interval excludes zero (p below 1 − confidence). */
  readonly significant: boolean;
}

/** One trend as the difference test needs it. */
export interface TrendForDifference {
  readonly slope: number;
  readonly standardError: number;
  readonly degreesOfFreedom: number;
}

/**
 * Tests whether two trends differ: the normalised difference of Santer et al. (2008) with
 * the two standard errors combined in quadrature, against Student's t at Welch–
 * Satterthwaite degrees of freedom (each trend bringing its own n_eff − 2). It treats the
 * two series' noise as independent; positively correlated noise (as in day and night
 * temperatures from the same stations) makes the test conservative.
 *
 * Formula: d = (b₁ − b₂)/√(s₁² + s₂²), ν = (s₁² + s₂²)² / (s₁⁴/ν₁ + s₂⁴/ν₂)
 *
 * @param first the first trend (slope, adjusted standard error, ν₁)
 * @param second the second trend
 * @param confidence the interval's confidence level (default 0.95)
 * @returns the difference first − second with its interval and test
 * @throws {CalcInputError} when a standard error or ν is not positive
 * @example
 * trendDifference({ slope: 0.3, standardError: 0.05, degreesOfFreedom: 20 },
 *   { slope: 0.1, standardError: 0.05, degreesOfFreedom: 20 }).significant // => true
 * @see Santer2008 (eq. 12), Satterthwaite1946
 */
export function trendDifference(
  first: TrendForDifference,
  second: TrendForDifference,
  confidence = 0.95,
): TrendDifference {
  requirePositive(first.degreesOfFreedom, 'degreesOfFreedom', 'trendDifference');
  requirePositive(second.degreesOfFreedom, 'degreesOfFreedom', 'trendDifference');
  const firstVariance = first.standardError ** 2;
  const secondVariance = second.standardError ** 2;
  const variance = firstVariance + secondVariance;
  const difference = first.slope - second.slope;
  if (variance === 0) {
    // Two perfect straight lines: the difference is known exactly.
    return {
      difference,
      standardError: 0,
      degreesOfFreedom: first.degreesOfFreedom + second.degreesOfFreedom,
      testStatistic: difference === 0 ? 0 : Math.sign(difference) * Number.MAX_VALUE,
      pValue: difference === 0 ? 1 : 0,
      low: difference,
      high: difference,
      significant: difference !== 0,
    };
  }
  const standardError = Math.sqrt(variance);
  const degreesOfFreedom =
    variance ** 2 /
    (firstVariance ** 2 / first.degreesOfFreedom + secondVariance ** 2 / second.degreesOfFreedom);
  const testStatistic = difference / standardError;
  const pValue = 2 * (1 - studentTCumulative(Math.abs(testStatistic), degreesOfFreedom));
  const criticalT = studentTQuantile(1 - (1 - confidence) / 2, degreesOfFreedom);
  return {
    difference,
    standardError,
    degreesOfFreedom,
    testStatistic,
    pValue,
    low: difference - criticalT * standardError,
    high: difference + criticalT * standardError,
    significant: pValue < 1 - confidence,
  };
}
