import { CalcInputError } from '../errors/calc-input-error.js';

/** The least-squares straight line through a set of points, and the sums it came from. */
export interface LeastSquaresLine {
  /** Number of points used. */
  readonly count: number;
  /** Slope b, in units of y per unit of t. */
  readonly slope: number;
  /** Intercept a at t = 0, in units of y. */
  readonly intercept: number;
  /** Mean of t over the points. */
  readonly meanTime: number;
  /** Σ (tᵢ − t̄)². */
  readonly sumSquaredTimeDeviations: number;
  /** Σ eᵢ², with residuals eᵢ = yᵢ − (a + b tᵢ). */
  readonly sumSquaredResiduals: number;
  /** Σ eᵢ eᵢ₊₁ over successive points, for the lag-1 autocorrelation. */
  readonly sumLag1ResidualProducts: number;
}

/**
 * Ordinary least-squares fit of y = a + b t to the points with index from `startIndex`
 * (inclusive) to `endIndex` (exclusive), with the residual sums a trend interval needs.
 * Sums are taken about the means, which keeps precision when t is a calendar year; the
 * residuals are not stored, so a long series costs three passes and no allocation.
 *
 * Formula: b = Σ (tᵢ − t̄)(yᵢ − ȳ) / Σ (tᵢ − t̄)², a = ȳ − b t̄, eᵢ = (yᵢ − ȳ) − b (tᵢ − t̄)
 *
 * @param times t values (e.g. decimal years)
 * @param values y values, same length as times
 * @param startIndex first point used (default 0)
 * @param endIndex one past the last point used (default all)
 * @returns the line and its sums
 * @throws {CalcInputError} when fewer than 2 points are used or all t are equal
 * @example
 * ordinaryLeastSquares([0, 1, 2], [1, 3, 5]).slope // => 2
 * @see Santer2000 (least-squares trend)
 */
export function ordinaryLeastSquares(
  times: ArrayLike<number>,
  values: ArrayLike<number>,
  startIndex = 0,
  endIndex = times.length,
): LeastSquaresLine {
  const count = endIndex - startIndex;
  if (count < 2) {
    throw new CalcInputError(
      'series',
      'a least-squares line needs at least 2 points',
      'ordinaryLeastSquares',
    );
  }
  let sumTime = 0;
  let sumValue = 0;
  for (let index = startIndex; index < endIndex; index += 1) {
    sumTime += times[index] ?? 0;
    sumValue += values[index] ?? 0;
  }
  const meanTime = sumTime / count;
  const meanValue = sumValue / count;
  let sumSquaredTimeDeviations = 0;
  let sumCrossDeviations = 0;
  for (let index = startIndex; index < endIndex; index += 1) {
    const timeDeviation = (times[index] ?? 0) - meanTime;
    sumSquaredTimeDeviations += timeDeviation * timeDeviation;
    sumCrossDeviations += timeDeviation * ((values[index] ?? 0) - meanValue);
  }
  if (sumSquaredTimeDeviations === 0) {
    throw new CalcInputError(
      'series',
      'a least-squares line needs at least two different times',
      'ordinaryLeastSquares',
    );
  }
  const slope = sumCrossDeviations / sumSquaredTimeDeviations;
  let sumSquaredResiduals = 0;
  let sumLag1ResidualProducts = 0;
  let previousResidual = 0;
  for (let index = startIndex; index < endIndex; index += 1) {
    const residual = (values[index] ?? 0) - meanValue - slope * ((times[index] ?? 0) - meanTime);
    sumSquaredResiduals += residual * residual;
    if (index > startIndex) sumLag1ResidualProducts += previousResidual * residual;
    previousResidual = residual;
  }
  return {
    count,
    slope,
    intercept: meanValue - slope * meanTime,
    meanTime,
    sumSquaredTimeDeviations,
    sumSquaredResiduals,
    sumLag1ResidualProducts,
  };
}

/**
 * The residuals eᵢ = yᵢ − (a + b tᵢ) of a least-squares line, in point order.
 *
 * @example
 * leastSquaresResiduals([0, 1, 2], [0, 2, 1]) // ≈ [-0.5, 1, -0.5]
 */
export function leastSquaresResiduals(
  times: ArrayLike<number>,
  values: ArrayLike<number>,
): Float64Array {
  const line = ordinaryLeastSquares(times, values);
  const residuals = new Float64Array(times.length);
  for (let index = 0; index < times.length; index += 1) {
    residuals[index] = (values[index] ?? 0) - line.intercept - line.slope * (times[index] ?? 0);
  }
  return residuals;
}
