import fc from 'fast-check';
import { describe, it } from 'vitest';
import { expectCalcInputError } from '../../test/expect-calc-input-error.js';
import { expectClose } from '../../test/expect-close.js';
import { solveLinearSystem } from './solve-linear-system.js';

describe('solveLinearSystem', () => {
  it('solves the classic worked example of Gaussian elimination', () => {
    // from memory: the standard textbook example 2x + y − z = 8, −3x − y + 2z = −11, −2x + y + 2z = −3 has x = 2, y = 3, z = −1
    const [x, y, z] = solveLinearSystem(
      [
        [2, 1, -1],
        [-3, -1, 2],
        [-2, 1, 2],
      ],
      [8, -11, -3],
    );
    expectClose(x ?? Number.NaN, 2, { abs: 1e-12 });
    expectClose(y ?? Number.NaN, 3, { abs: 1e-12 });
    expectClose(z ?? Number.NaN, -1, { abs: 1e-12 });
  });

  it('needs a pivot when the first entry is zero', () => {
    const [x, y] = solveLinearSystem(
      [
        [0, 1],
        [1, 0],
      ],
      [2, 3],
    );
    expectClose(x ?? Number.NaN, 3, { abs: 1e-15 });
    expectClose(y ?? Number.NaN, 2, { abs: 1e-15 });
  });

  it('returns a solution that satisfies diagonally dominant random systems', () => {
    fc.assert(
      fc.property(
        fc.integer({ min: 1, max: 11 }).chain((size) =>
          fc.tuple(
            fc.array(
              fc.array(fc.double({ min: -1, max: 1, noNaN: true }), {
                minLength: size,
                maxLength: size,
              }),
              { minLength: size, maxLength: size },
            ),
            fc.array(fc.double({ min: -10, max: 10, noNaN: true }), {
              minLength: size,
              maxLength: size,
            }),
          ),
        ),
        ([rows, constants]) => {
          const matrix = rows.map((row, index) =>
            row.map((entry, column) => (column === index ? entry + 2 * row.length : entry)),
          );
          const solution = solveLinearSystem(matrix, constants);
          matrix.forEach((row, index) => {
            const product = row.reduce(
              (sum, entry, column) => sum + entry * (solution[column] ?? 0),
              0,
            );
            expectClose(product, constants[index] ?? 0, { abs: 1e-9 });
          });
        },
      ),
    );
  });

  it('refuses singular and mismatched systems', () => {
    expectCalcInputError(
      () =>
        solveLinearSystem(
          [
            [1, 2],
            [2, 4],
          ],
          [1, 2],
        ),
      'matrix',
      /singular/,
    );
    expectCalcInputError(() => solveLinearSystem([[1, 2]], [1]), 'matrix', /square/);
  });
});
