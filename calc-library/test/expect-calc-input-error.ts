import { expect } from 'vitest';
import { CalcInputError } from '../src/errors/calc-input-error.js';

/**
 * Asserts that `run` throws a CalcInputError for `field`, whose rule matches `rule` when
 * given. Returns the error for further checks.
 */
export function expectCalcInputError(
  run: () => unknown,
  field: string,
  rule?: RegExp,
): CalcInputError {
  let caught: unknown;
  try {
    run();
  } catch (error) {
    caught = error;
  }
  expect(caught, `expected a CalcInputError for ${field}`).toBeInstanceOf(CalcInputError);
  const error = caught as CalcInputError;
  expect(error.field).toBe(field);
  expect(error.rule.length).toBeGreaterThan(0);
  if (rule !== undefined) expect(error.rule).toMatch(rule);
  return error;
}
