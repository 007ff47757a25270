import { requireInRange } from '../errors/require-finite.js';

/**
 * Effective number of independent values in a series whose residuals have lag-1
 * autocorrelation r₁ (an AR(1) approximation). A negative r₁ would make n_eff larger than
 * n; the library does not let it, so that an interval is never narrower than the plain
 * least-squares one.
 *
 * Formula: n_eff = n (1 − r₁) / (1 + r₁), capped at n
 *
 * @param count n, the number of values (≥ 1)
 * @param lag1 r₁, the lag-1 autocorrelation of the residuals (−1 < r₁ < 1)
 * @returns n_eff (dimensionless, may be fractional)
 * @throws {CalcInputError} when n < 1 or r₁ is outside (−1, 1)
 * @example
 * effectiveSampleSize(100, 0.5) // ≈ 33.333333333333336
 * @see Santer2008, Santer2000 (effective sample size for an AR(1) process)
 */
export function effectiveSampleSize(count: number, lag1: number): number {
  requireInRange(count, 'count', 1, Number.MAX_SAFE_INTEGER, 'effectiveSampleSize');
  requireInRange(lag1, 'lag1', -0.999999999, 0.999999999, 'effectiveSampleSize');
  return Math.min(count, (count * (1 - lag1)) / (1 + lag1));
}
