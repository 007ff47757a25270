import { CalcInputError } from '../errors/calc-input-error.js';
import { effectiveSampleSize } from './effective-sample-size.js';
import { ordinaryLeastSquares } from './ordinary-least-squares.js';
import { studentTQuantile } from './student-t-distribution.js';

/** A least-squares trend with its interval corrected for lag-1 autocorrelation. */
export interface AdjustedTrend {
  /** Number of points n. */
  readonly count: number;
  /** Slope b, in units of y per unit of t. */
  readonly slope: number;
  /** Intercept a, in units of y. */
  readonly intercept: number;
  /** Plain least-squares standard error of b, s_b = √(Σe² / (n − 2) / Σ(t − t̄)²). */
  readonly ordinaryStandardError: number;
  /** Lag-1 autocorrelation r₁ of the residuals. */
  readonly lag1Autocorrelation: number;
  /** n_eff = n (1 − r₁)/(1 + r₁), capped at n. */
  readonly effectiveSampleSize: number;
  /** s_b inflated for autocorrelation: s_b √((n − 2)/(n_eff − 2)). */
  readonly standardError: number;
  /** ν = n_eff − 2. */
  readonly degreesOfFreedom: number;
  /** t quantile for the interval at ν degrees of freedom. */
  readonly criticalT: number;
  /** Lower end of the interval, b − t s_b,adj. */
  readonly low: number;
  /** Upper end of the interval, b + t s_b,adj. */
  readonly high: number;
}

/**
 * A least-squares trend with a confidence interval that allows for lag-1 autocorrelation
 * of the residuals, as Santer et al. (2000, 2008) do: the residual variance is divided by
 * n_eff − 2 instead of n − 2, and the t quantile is taken at n_eff − 2 degrees of freedom.
 *
 * Formula: b ± t₍₁₋α/2, n_eff−2₎ × s_b √((n − 2)/(n_eff − 2)), n_eff = n (1 − r₁)/(1 + r₁)
 *
 * @param times t values in ascending order (e.g. decimal years)
 * @param values y values
 * @param startIndex first point used (default 0)
 * @param endIndex one past the last point used (default all)
 * @param confidence the interval's confidence level, 0–1 exclusive (default 0.95)
 * @param field input name reported if the series is too short
 * @returns the trend, in y units per t unit, with its interval
 * @throws {CalcInputError} when fewer than 3 points are used, or n_eff ≤ 2 (the series is
 *   too short or too autocorrelated for an interval)
 * @example
 * const trend = autocorrelationAdjustedTrend([0, 1, 2, 3], [0, 1, 2, 3]);
 * trend.slope // => 1
 * @see Santer2000, Santer2008
 */
export function autocorrelationAdjustedTrend(
  times: ArrayLike<number>,
  values: ArrayLike<number>,
  startIndex = 0,
  endIndex = times.length,
  confidence = 0.95,
  field = 'series',
): AdjustedTrend {
  const count = endIndex - startIndex;
  if (count < 3) {
    throw new CalcInputError(
      field,
      `${field} needs at least 3 points for a trend interval (has ${count})`,
      'autocorrelationAdjustedTrend',
    );
  }
  const line = ordinaryLeastSquares(times, values, startIndex, endIndex);
  // r₁ = Σ eᵢ eᵢ₊₁ / Σ eᵢ², the estimator of lag1Autocorrelation, from the sums of the fit.
  const lag1 =
    line.sumSquaredResiduals === 0 ? 0 : line.sumLag1ResidualProducts / line.sumSquaredResiduals;
  // r₁ can only reach ±1 for degenerate residuals; keep it inside the open interval.
  const boundedLag1 = Math.min(0.999999999, Math.max(-0.999999999, lag1));
  const effectiveCount = effectiveSampleSize(count, boundedLag1);
  if (effectiveCount <= 2) {
    throw new CalcInputError(
      field,
      `${field} is too short or too autocorrelated for a trend interval: n = ${count}, ` +
        `lag-1 autocorrelation r1 = ${lag1.toFixed(3)}, effective sample size ` +
        `n_eff = ${effectiveCount.toFixed(2)}, and an interval needs n_eff > 2 (Santer et al. 2008)`,
      'autocorrelationAdjustedTrend',
    );
  }
  const ordinaryStandardError = Math.sqrt(
    line.sumSquaredResiduals / (count - 2) / line.sumSquaredTimeDeviations,
  );
  const standardError = ordinaryStandardError * Math.sqrt((count - 2) / (effectiveCount - 2));
  const degreesOfFreedom = effectiveCount - 2;
  const criticalT = studentTQuantile(1 - (1 - confidence) / 2, degreesOfFreedom);
  return {
    count,
    slope: line.slope,
    intercept: line.intercept,
    ordinaryStandardError,
    lag1Autocorrelation: lag1,
    effectiveSampleSize: effectiveCount,
    standardError,
    degreesOfFreedom,
    criticalT,
    low: line.slope - criticalT * standardError,
    high: line.slope + criticalT * standardError,
  };
}
