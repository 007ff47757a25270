import { CalcInputError } from '../errors/calc-input-error.js';
import { requirePositive } from '../errors/require-finite.js';
import { logGamma } from './log-gamma.js';

const tiny = 1e-300;
const relativeTolerance = 1e-15;
const maximumIterations = 20000;

// The continued fraction of DLMF 8.17.22, evaluated by the modified Lentz method
// (Press et al. 2007, section 5.2). It converges fast for x < (a + 1) / (a + b + 2).
function incompleteBetaContinuedFraction(x: number, a: number, b: number): number {
  let numeratorTerm = 1;
  let denominatorTerm = 1 - ((a + b) * x) / (a + 1);
  if (Math.abs(denominatorTerm) < tiny) denominatorTerm = tiny;
  denominatorTerm = 1 / denominatorTerm;
  let fraction = denominatorTerm;
  for (let step = 1; step <= maximumIterations; step += 1) {
    const twiceStep = 2 * step;
    // Even coefficient d₂ₘ.
    let coefficient = (step * (b - step) * x) / ((a - 1 + twiceStep) * (a + twiceStep));
    denominatorTerm = 1 + coefficient * denominatorTerm;
    if (Math.abs(denominatorTerm) < tiny) denominatorTerm = tiny;
    numeratorTerm = 1 + coefficient / numeratorTerm;
    if (Math.abs(numeratorTerm) < tiny) numeratorTerm = tiny;
    denominatorTerm = 1 / denominatorTerm;
    fraction *= denominatorTerm * numeratorTerm;
    // Odd coefficient d₂ₘ₊₁.
    coefficient = (-(a + step) * (a + b + step) * x) / ((a + twiceStep) * (a + 1 + twiceStep));
    denominatorTerm = 1 + coefficient * denominatorTerm;
    if (Math.abs(denominatorTerm) < tiny) denominatorTerm = tiny;
    numeratorTerm = 1 + coefficient / numeratorTerm;
    if (Math.abs(numeratorTerm) < tiny) numeratorTerm = tiny;
    denominatorTerm = 1 / denominatorTerm;
    const change = denominatorTerm * numeratorTerm;
    fraction *= change;
    if (Math.abs(change - 1) < relativeTolerance) return fraction;
  }
  throw new CalcInputError(
    'shape',
    `the incomplete beta function did not converge for a = ${a}, b = ${b}`,
    'regularizedIncompleteBeta',
  );
}

/**
 * The regularized incomplete beta function Iₓ(a, b): the cumulative distribution of the
 * beta distribution, and the basis of Student's t distribution.
 *
 * Formula: Iₓ(a, b) = xᵃ (1 − x)ᵇ / (a B(a, b)) × 1/(1+ d₁/(1+ d₂/(1+ …))) (DLMF 8.17.22),
 * with Iₓ(a, b) = 1 − I₁₋ₓ(b, a) used where the fraction converges slowly.
 *
 * @param x upper limit, 0–1 (dimensionless)
 * @param a first shape parameter, > 0
 * @param b second shape parameter, > 0
 * @returns Iₓ(a, b), 0–1
 * @throws {CalcInputError} when x is outside 0–1, a shape is not positive, or the fraction
 *   does not converge (shapes above about 10⁸)
 * @example
 * regularizedIncompleteBeta(0.5, 2, 2) // ≈ 0.5
 * @see Olver2010 (DLMF 8.17.22), Press2007 (section 6.4)
 */
export function regularizedIncompleteBeta(x: number, a: number, b: number): number {
  if (!(x >= 0 && x <= 1)) {
    throw new CalcInputError('x', 'x must be between 0 and 1', 'regularizedIncompleteBeta');
  }
  requirePositive(a, 'a', 'regularizedIncompleteBeta');
  requirePositive(b, 'b', 'regularizedIncompleteBeta');
  if (x === 0) return 0;
  if (x === 1) return 1;
  const logPrefactor =
    logGamma(a + b) - logGamma(a) - logGamma(b) + a * Math.log(x) + b * Math.log1p(-x);
  const prefactor = Math.exp(logPrefactor);
  if (x < (a + 1) / (a + b + 2)) {
    return (prefactor * incompleteBetaContinuedFraction(x, a, b)) / a;
  }
  return 1 - (prefactor * incompleteBetaContinuedFraction(1 - x, b, a)) / b;
}
