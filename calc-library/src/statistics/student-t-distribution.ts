import { CalcInputError } from '../errors/calc-input-error.js';
import { requirePositive } from '../errors/require-finite.js';
import { logGamma } from './log-gamma.js';
import { regularizedIncompleteBeta } from './regularized-incomplete-beta.js';

/**
 * Upper tail probability of Student's t distribution, P(T > t), for t ≥ 0. Near t = 0 the
 * complementary form keeps its precision (x = ν/(ν + t²) would round to 1).
 *
 * Formula: P(T > t) = ½ I_{ν/(ν+t²)}(ν/2, ½) = ½ − ½ I_{t²/(ν+t²)}(½, ν/2)
 *
 * @param tValue t ≥ 0
 * @param degreesOfFreedom ν > 0, need not be a whole number
 * @returns the probability, 0–0.5
 * @see Olver2010 (DLMF 8.17.1 with the t–beta relation, and 8.17.4 for the symmetry)
 */
function studentTUpperTail(tValue: number, degreesOfFreedom: number): number {
  const squared = tValue * tValue;
  if (squared < degreesOfFreedom) {
    return (
      0.5 -
      0.5 *
        regularizedIncompleteBeta(squared / (degreesOfFreedom + squared), 0.5, degreesOfFreedom / 2)
    );
  }
  return (
    0.5 *
    regularizedIncompleteBeta(
      degreesOfFreedom / (degreesOfFreedom + squared),
      degreesOfFreedom / 2,
      0.5,
    )
  );
}

/**
 * Cumulative distribution function of Student's t distribution, P(T ≤ t).
 *
 * Formula: F(t) = 1 − ½ I_{ν/(ν+t²)}(ν/2, ½) for t ≥ 0, and F(−t) = 1 − F(t)
 *
 * @param tValue any finite t
 * @param degreesOfFreedom ν > 0, need not be a whole number
 * @returns P(T ≤ t), 0–1
 * @throws {CalcInputError} when t is not finite or ν is not positive
 * @example
 * studentTCumulative(0, 7.5) // => 0.5
 * @see Olver2010 (DLMF 8.17)
 */
export function studentTCumulative(tValue: number, degreesOfFreedom: number): number {
  if (!Number.isFinite(tValue)) {
    throw new CalcInputError('t', 't must be a finite number', 'studentTCumulative');
  }
  requirePositive(degreesOfFreedom, 'degreesOfFreedom', 'studentTCumulative');
  const upperTail = studentTUpperTail(Math.abs(tValue), degreesOfFreedom);
  return tValue >= 0 ? 1 - upperTail : upperTail;
}

/**
 * Probability density of Student's t distribution.
 *
 * Formula: f(t) = Γ((ν+1)/2) / (√(νπ) Γ(ν/2)) (1 + t²/ν)^(−(ν+1)/2)
 *
 * @param tValue any finite t
 * @param degreesOfFreedom ν > 0
 * @returns the density
 * @example
 * studentTDensity(0, 1) // ≈ 0.3183098861837907 (1/π)
 */
export function studentTDensity(tValue: number, degreesOfFreedom: number): number {
  requirePositive(degreesOfFreedom, 'degreesOfFreedom', 'studentTDensity');
  const halfSum = (degreesOfFreedom + 1) / 2;
  return Math.exp(
    logGamma(halfSum) -
      logGamma(degreesOfFreedom / 2) -
      0.5 * Math.log(degreesOfFreedom * Math.PI) -
      halfSum * Math.log1p((tValue * tValue) / degreesOfFreedom),
  );
}

// A starting value for Newton's method: the normal quantile by the rational approximation
// of Abramowitz & Stegun 26.2.23 (error below 4.5 × 10⁻⁴), corrected for ν by the first two
// terms of the expansion 26.7.5. Only a start: Newton's method then solves exactly.
function startingQuantile(tailProbability: number, degreesOfFreedom: number): number {
  const root = Math.sqrt(-2 * Math.log(tailProbability));
  const normal =
    root -
    (2.515517 + 0.802853 * root + 0.010328 * root * root) /
      (1 + 1.432788 * root + 0.189269 * root * root + 0.001308 * root * root * root);
  const cubed = normal ** 3;
  const estimate =
    normal +
    (cubed + normal) / (4 * degreesOfFreedom) +
    (5 * normal ** 5 + 16 * cubed + 3 * normal) / (96 * degreesOfFreedom ** 2);
  return Number.isFinite(estimate) && estimate > 0 ? estimate : 1;
}

/**
 * Quantile (inverse cumulative distribution) of Student's t distribution: the t with
 * P(T ≤ t) = p. Solved by Newton's method on the upper tail from an approximate start,
 * kept inside a bracket by bisection, so it works for any positive (also fractional)
 * degrees of freedom.
 *
 * Formula: t such that ½ I_{ν/(ν+t²)}(ν/2, ½) = 1 − p (for p > ½; symmetric below)
 *
 * @param probability p, strictly between 0 and 1
 * @param degreesOfFreedom ν > 0 (fractional values allowed, as for n_eff − 2); up to about 10⁸
 * @returns the quantile t (dimensionless)
 * @throws {CalcInputError} when p is outside (0, 1) or ν is not positive
 * @example
 * studentTQuantile(0.975, 10) // ≈ 2.2281388519649385
 * @see Olver2010 (DLMF 8.17), Abramowitz1964 (26.2.23 and 26.7.5 for the start), NIST2012
 */
export function studentTQuantile(probability: number, degreesOfFreedom: number): number {
  if (!(probability > 0 && probability < 1)) {
    throw new CalcInputError(
      'probability',
      'probability must be strictly between 0 and 1',
      'studentTQuantile',
    );
  }
  requirePositive(degreesOfFreedom, 'degreesOfFreedom', 'studentTQuantile');
  if (probability === 0.5) return 0;
  const tailProbability = probability > 0.5 ? 1 - probability : probability;
  // The root of g(t) = tail − P(T > t), which increases with t, lies in (low, high).
  let low = 0;
  let high = Number.POSITIVE_INFINITY;
  let estimate = startingQuantile(tailProbability, degreesOfFreedom);
  for (let iteration = 0; iteration < 300; iteration += 1) {
    const difference = tailProbability - studentTUpperTail(estimate, degreesOfFreedom);
    if (difference === 0) break;
    if (difference > 0) high = estimate;
    else low = estimate;
    // d/dt of (tail − P(T > t)) is the density f(t), so Newton's step is −difference / f.
    let next = estimate - difference / studentTDensity(estimate, degreesOfFreedom);
    if (!(next > low && next < high)) {
      next = Number.isFinite(high) ? (low + high) / 2 : 2 * estimate;
    }
    if (Math.abs(next - estimate) <= 1e-15 * Math.max(1, Math.abs(estimate))) {
      estimate = next;
      break;
    }
    estimate = next;
  }
  return probability > 0.5 ? estimate : -estimate;
}
