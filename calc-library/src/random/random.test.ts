import { describe, expect, it } from 'vitest';
import { expectCalcInputError } from '../../test/expect-calc-input-error.js';
import { expectClose } from '../../test/expect-close.js';
import { createSeededRandom } from './seeded-random.js';
import { standardNormalDeviate } from './standard-normal-deviate.js';

describe('createSeededRandom', () => {
  it('repeats its sequence for the same seed and differs for another', () => {
    const first = createSeededRandom(123);
    const again = createSeededRandom(123);
    const other = createSeededRandom(124);
    const firstValues = Array.from({ length: 100 }, () => first());
    expect(Array.from({ length: 100 }, () => again())).toEqual(firstValues);
    expect(Array.from({ length: 100 }, () => other())).not.toEqual(firstValues);
  });

  it('draws uniformly from [0, 1)', () => {
    const random = createSeededRandom(1);
    let sum = 0;
    let sumOfSquares = 0;
    const count = 100000;
    for (let index = 0; index < count; index += 1) {
      const value = random();
      expect(value >= 0 && value < 1).toBe(true);
      sum += value;
      sumOfSquares += value * value;
    }
    // The uniform distribution on [0, 1) has mean 1/2 and variance 1/12; with 10⁵ draws the
    // sample mean is within about 0.003 (3 standard errors).
    expectClose(sum / count, 0.5, { abs: 0.003 });
    expectClose(sumOfSquares / count - (sum / count) ** 2, 1 / 12, { abs: 0.002 });
  });

  it('refuses a seed that is not a 32-bit whole number', () => {
    expectCalcInputError(() => createSeededRandom(-1), 'seed');
    expectCalcInputError(() => createSeededRandom(1.5), 'seed');
  });
});

describe('standardNormalDeviate', () => {
  it('has mean 0 and standard deviation 1', () => {
    const random = createSeededRandom(9);
    const draws = Array.from({ length: 100000 }, () => standardNormalDeviate(random));
    const mean = draws.reduce((sum, value) => sum + value, 0) / draws.length;
    const variance = draws.reduce((sum, value) => sum + (value - mean) ** 2, 0) / draws.length;
    expectClose(mean, 0, { abs: 0.015 });
    expectClose(variance, 1, { abs: 0.02 });
  });
});
