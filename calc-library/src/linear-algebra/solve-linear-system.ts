import { CalcInputError } from '../errors/calc-input-error.js';

/**
 * Solves A x = b in place by Gaussian elimination with partial pivoting. A is stored row
 * by row in a flat array (entry (i, j) at i·n + j); both A and b are overwritten, and b ends
 * up holding x. The layer model calls it once per Monte Carlo sample, so it allocates
 * nothing.
 *
 * @param matrix A, n × n entries, row by row (overwritten)
 * @param rightHandSide b, n entries (overwritten with the solution x)
 * @param size n
 * @throws {CalcInputError} when A is singular
 * @see Press2007 (section 2.2)
 */
export function solveLinearSystemInPlace(
  matrix: Float64Array,
  rightHandSide: Float64Array,
  size: number,
): void {
  let largestEntry = 0;
  for (let index = 0; index < size * size; index += 1) {
    largestEntry = Math.max(largestEntry, Math.abs(matrix[index] ?? 0));
  }
  const singularThreshold = largestEntry * size * Number.EPSILON;

  for (let column = 0; column < size; column += 1) {
    let pivotRow = column;
    let pivotMagnitude = Math.abs(matrix[column * size + column] ?? 0);
    for (let row = column + 1; row < size; row += 1) {
      const magnitude = Math.abs(matrix[row * size + column] ?? 0);
      if (magnitude > pivotMagnitude) {
        pivotRow = row;
        pivotMagnitude = magnitude;
      }
    }
    if (pivotMagnitude <= singularThreshold) {
      throw new CalcInputError('matrix', 'the linear system is singular', 'solveLinearSystem');
    }
    if (pivotRow !== column) {
      for (let entry = 0; entry < size; entry += 1) {
        const swapped = matrix[pivotRow * size + entry] ?? 0;
        matrix[pivotRow * size + entry] = matrix[column * size + entry] ?? 0;
        matrix[column * size + entry] = swapped;
      }
      const swappedConstant = rightHandSide[pivotRow] ?? 0;
      rightHandSide[pivotRow] = rightHandSide[column] ?? 0;
      rightHandSide[column] = swappedConstant;
    }
    const pivot = matrix[column * size + column] ?? 1;
    for (let row = column + 1; row < size; row += 1) {
      const factor = (matrix[row * size + column] ?? 0) / pivot;
      if (factor === 0) continue;
      for (let entry = column; entry < size; entry += 1) {
        matrix[row * size + entry] =
          (matrix[row * size + entry] ?? 0) - factor * (matrix[column * size + entry] ?? 0);
      }
      rightHandSide[row] = (rightHandSide[row] ?? 0) - factor * (rightHandSide[column] ?? 0);
    }
  }

  for (let row = size - 1; row >= 0; row -= 1) {
    let remainder = rightHandSide[row] ?? 0;
    for (let entry = row + 1; entry < size; entry += 1) {
      remainder -= (matrix[row * size + entry] ?? 0) * (rightHandSide[entry] ?? 0);
    }
    rightHandSide[row] = remainder / (matrix[row * size + row] ?? 1);
  }
}

/**
 * Solves the square linear system A x = b by Gaussian elimination with partial pivoting,
 * leaving its inputs untouched.
 *
 * Formula: for each column k, swap in the row with the largest |aᵢₖ|, eliminate below it,
 * then back-substitute xᵢ = (bᵢ − Σⱼ₍ⱼ>ᵢ₎ aᵢⱼ xⱼ) / aᵢᵢ
 *
 * @param matrix A, n rows of n numbers
 * @param rightHandSide b, n numbers
 * @returns x, n numbers
 * @throws {CalcInputError} when the sizes do not match or A is singular
 * @example
 * solveLinearSystem([[2, 1], [1, 3]], [3, 5]) // ≈ [0.8, 1.4]
 * @see Press2007 (section 2.2)
 */
export function solveLinearSystem(
  matrix: readonly (readonly number[])[],
  rightHandSide: readonly number[],
): number[] {
  const size = rightHandSide.length;
  if (matrix.length !== size || matrix.some((row) => row.length !== size)) {
    throw new CalcInputError(
      'matrix',
      'matrix must be square and match the right-hand side',
      'solveLinearSystem',
    );
  }
  const flat = new Float64Array(size * size);
  matrix.forEach((row, rowIndex) => flat.set(row, rowIndex * size));
  const solution = Float64Array.from(rightHandSide);
  solveLinearSystemInPlace(flat, solution, size);
  return [...solution];
}
