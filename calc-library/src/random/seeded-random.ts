import { CalcInputError } from '../errors/calc-input-error.js';

/** A source of uniform random numbers in [0, 1). */
export type UniformRandom = () => number;

/** The seed a Monte Carlo band uses unless told otherwise, so that bands are reproducible. */
export const defaultSeed = 20190520;

/**
 * A seeded generator of uniform numbers in [0, 1): Marsaglia's xorshift128, whose four
 * 32-bit words are filled from the seed by a linear congruential step (the constants
 * 1664525 and 1013904223 of Press et al. 2007, section 7.1). The same seed always gives
 * the same sequence, on every JavaScript engine.
 *
 * Formula: t = x ⊕ (x ≪ 11); x, y, z ← y, z, w; w ← w ⊕ (w ≫ 19) ⊕ t ⊕ (t ≫ 8)
 *
 * @param seed an integer from 0 to 2³² − 1
 * @returns a function that returns the next number in [0, 1) at each call
 * @throws {CalcInputError} when the seed is not such an integer
 * @example
 * const next = createSeededRandom(1);
 * next() === createSeededRandom(1)() // => true
 * @see Marsaglia2003 (xor128)
 */
export function createSeededRandom(seed: number): UniformRandom {
  if (!Number.isInteger(seed) || seed < 0 || seed > 0xffffffff) {
    throw new CalcInputError(
      'seed',
      'seed must be an integer from 0 to 4294967295',
      'createSeededRandom',
    );
  }
  let state = seed >>> 0;
  const nextWord = (): number => {
    state = (Math.imul(state, 1664525) + 1013904223) >>> 0;
    return state;
  };
  let x = nextWord();
  let y = nextWord();
  let z = nextWord();
  let w = nextWord();
  // xorshift must not start from all zeros; the LCG cannot give four zeros in a row, but
  // keep the guard where the reason is visible.
  if ((x | y | z | w) === 0) w = 1;
  return () => {
    const t = (x ^ (x << 11)) >>> 0;
    x = y;
    y = z;
    z = w;
    w = (w ^ (w >>> 19) ^ (t ^ (t >>> 8))) >>> 0;
    return w / 4294967296;
  };
}
