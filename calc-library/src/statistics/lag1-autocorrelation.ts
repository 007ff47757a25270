/**
 * Lag-1 autocorrelation of regression residuals (which have mean zero): how much each
 * residual resembles the next one.
 *
 * Formula: r₁ = Σᵢ₌₁ⁿ⁻¹ eᵢ eᵢ₊₁ / Σᵢ₌₁ⁿ eᵢ²
 *
 * @param residuals residuals in time order (dimensionless result)
 * @returns r₁, between −1 and 1; 0 when all residuals are zero
 * @example
 * lag1Autocorrelation([1, 1, -1, -1]) // => 0.25
 * @see Santer2000, Santer2008 (lag-1 autocorrelation of the regression residuals)
 */
export function lag1Autocorrelation(residuals: ArrayLike<number>): number {
  let sumOfProducts = 0;
  let sumOfSquares = 0;
  for (let index = 0; index < residuals.length; index += 1) {
    const residual = residuals[index] ?? 0;
    sumOfSquares += residual * residual;
    if (index + 1 < residuals.length) sumOfProducts += residual * (residuals[index + 1] ?? 0);
  }
  return sumOfSquares === 0 ? 0 : sumOfProducts / sumOfSquares;
}
