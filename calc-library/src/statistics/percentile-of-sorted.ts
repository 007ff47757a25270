import { CalcInputError } from '../errors/calc-input-error.js';

/**
 * A percentile of values already sorted in ascending order, by linear interpolation
 * between order statistics (Hyndman & Fan's type 7, the default of R and NumPy).
 *
 * Formula: h = (n − 1) p; Q(p) = x₍⌊h⌋₎ + (h − ⌊h⌋)(x₍⌊h⌋+1₎ − x₍⌊h⌋₎), indices from 0
 *
 * @param sortedValues values in ascending order (at least one)
 * @param probability the percentile as a fraction, 0–1 (0.05 for the 5th percentile)
 * @returns the percentile, in the unit of the values
 * @throws {CalcInputError} when there are no values or the probability is outside 0–1
 * @example
 * percentileOfSorted([1, 2, 3, 4], 0.5) // => 2.5
 * @see Hyndman1996 (definition 7)
 */
export function percentileOfSorted(sortedValues: ArrayLike<number>, probability: number): number {
  const count = sortedValues.length;
  if (count === 0) {
    throw new CalcInputError('values', 'values must not be empty', 'percentileOfSorted');
  }
  if (!(probability >= 0 && probability <= 1)) {
    throw new CalcInputError(
      'probability',
      'probability must be between 0 and 1',
      'percentileOfSorted',
    );
  }
  const position = (count - 1) * probability;
  const lowerIndex = Math.floor(position);
  const upperIndex = Math.min(lowerIndex + 1, count - 1);
  const lower = sortedValues[lowerIndex] ?? Number.NaN;
  const upper = sortedValues[upperIndex] ?? Number.NaN;
  return lower + (position - lowerIndex) * (upper - lower);
}
