import type { NormalisedRange } from '@skyledger/calc';

/**
 * The value a run used for a number input as recorded in its result: the number itself,
 * or the middle of its range as the library takes it (the geometric mean for a lognormal).
 */
export function centralInput(recorded: number | NormalisedRange | undefined): number | undefined {
  if (recorded === undefined || typeof recorded === 'number') return recorded;
  return recorded.distribution === 'lognormal'
    ? Math.sqrt(recorded.low * recorded.high)
    : (recorded.low + recorded.high) / 2;
}
