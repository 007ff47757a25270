import { expect } from 'vitest';

/** How close a value must be: relative to the expected value, absolute, or both (the looser wins). */
export interface Tolerance {
  readonly rel?: number;
  readonly abs?: number;
}

/**
 * Asserts that `actual` is within the tolerance of `expected`. Fails on NaN, and refuses a
 * tolerance of nothing, so that no check passes by accident.
 */
export function expectClose(actual: number, expected: number, tolerance: Tolerance): void {
  if (tolerance.rel === undefined && tolerance.abs === undefined) {
    throw new Error('expectClose needs a rel or abs tolerance');
  }
  const bound = Math.max(tolerance.abs ?? 0, (tolerance.rel ?? 0) * Math.abs(expected));
  const difference = Math.abs(actual - expected);
  expect(
    difference <= bound,
    `expected ${actual} to be within ${bound} of ${expected} (difference ${difference})`,
  ).toBe(true);
}
