import { requirePositive } from '../errors/require-finite.js';

// Coefficients B₂ₖ / (2k (2k − 1)) of Stirling's series, from the Bernoulli numbers
// B₂ … B₁₄ = 1/6, −1/30, 1/42, −1/30, 5/66, −691/2730, 7/6 (DLMF 5.11.1 and 24.2).
const stirlingCoefficients = [
  1 / 12,
  -1 / 360,
  1 / 1260,
  -1 / 1680,
  1 / 1188,
  -691 / 360360,
  1 / 156,
] as const;

// Below this the series is shifted up by the recurrence; at z ≥ 10 the first omitted term
// is below 10⁻¹⁴ of the result.
const seriesThreshold = 10;

/**
 * The natural logarithm of the gamma function for positive arguments, by Stirling's series
 * after shifting the argument above 10 with the recurrence Γ(x + 1) = x Γ(x).
 *
 * Formula: ln Γ(z) ≈ (z − ½) ln z − z + ½ ln 2π + Σₖ B₂ₖ / (2k (2k − 1) z²ᵏ⁻¹)
 *
 * @param argument x > 0 (dimensionless)
 * @returns ln Γ(x)
 * @throws {CalcInputError} when the argument is not a positive finite number
 * @example
 * logGamma(5) // ≈ 3.1780538303479458 (ln 24)
 * @see Olver2010 (DLMF 5.5.1 and 5.11.1)
 */
export function logGamma(argument: number): number {
  requirePositive(argument, 'argument', 'logGamma');
  let shifted = argument;
  let logOfShift = 0;
  while (shifted < seriesThreshold) {
    logOfShift += Math.log(shifted);
    shifted += 1;
  }
  const inverse = 1 / shifted;
  const inverseSquared = inverse * inverse;
  let series = 0;
  for (let index = stirlingCoefficients.length - 1; index >= 0; index -= 1) {
    series = series * inverseSquared + (stirlingCoefficients[index] ?? 0);
  }
  series *= inverse;
  return (
    (shifted - 0.5) * Math.log(shifted) -
    shifted +
    0.5 * Math.log(2 * Math.PI) +
    series -
    logOfShift
  );
}
