import { CalcInputError } from '../errors/calc-input-error.js';
import { defaultSeed } from '../random/seeded-random.js';
import { type RunOptions } from './types.js';

/** Samples of a Monte Carlo band unless `options.samples` says otherwise. */
export const defaultSamples = 10000;

const minimumSamples = 100;
const maximumSamples = 200000;

/**
 * Checks `runCalculator` options and fills in the defaults.
 *
 * @throws {CalcInputError} when samples or seed are out of range
 */
export function readRunOptions(
  options: RunOptions | undefined,
  where: string,
): { samples: number; seed: number } {
  const samples = options?.samples ?? defaultSamples;
  const seed = options?.seed ?? defaultSeed;
  if (!Number.isInteger(samples) || samples < minimumSamples || samples > maximumSamples) {
    throw new CalcInputError(
      'samples',
      `samples must be a whole number from ${minimumSamples} to ${maximumSamples}`,
      where,
    );
  }
  if (!Number.isInteger(seed) || seed < 0 || seed > 0xffffffff) {
    throw new CalcInputError('seed', 'seed must be a whole number from 0 to 4294967295', where);
  }
  return { samples, seed };
}
