import {
  isCalcInputError,
  runCalculator,
  type AnyCalculatorResult,
  type CalculatorInfo,
} from '@skyledger/calc';
import { useMemo } from 'react';
import { useDebouncedValue } from '@/lib/use-debounced-value';
import { buildInputs } from '../form/build-inputs';
import type { FormState } from '../form/form-state';
import { useChosenDatasets } from './use-chosen-datasets';

export type LiveRun =
  /** A series is not chosen yet, or its dataset is loading. */
  | { state: 'waiting'; missing: string[] }
  /** Inputs the library (or the form) refuses: the rule by input name, or for the whole run. */
  | { state: 'refused'; fieldErrors: Record<string, string>; message: string | null }
  | { state: 'done'; result: AnyCalculatorResult };

// Long enough to let a number be typed in one go, short enough to feel live.
const typingPauseMs = 200;

/**
 * Runs the calculator in the browser on what the form holds, a moment after the typing
 * stops: the same library the server recomputes with, so the result reads alike in both.
 */
export function useLiveRun(calculator: CalculatorInfo, form: FormState): LiveRun {
  const settled = useDebouncedValue(form, typingPauseMs);
  const resolve = useChosenDatasets(settled);
  return useMemo((): LiveRun => {
    const built = buildInputs(calculator.inputs, settled, { for: 'run', resolve });
    if (Object.keys(built.problems).length > 0) {
      return { state: 'refused', fieldErrors: built.problems, message: null };
    }
    if (built.missing.length > 0) return { state: 'waiting', missing: built.missing };
    try {
      return { state: 'done', result: runCalculator(calculator.id, built.inputs) };
    } catch (error) {
      if (!isCalcInputError(error)) {
        return {
          state: 'refused',
          fieldErrors: {},
          message: `The calculator could not run: ${error instanceof Error ? error.message : String(error)}`,
        };
      }
      const known = calculator.inputs.some((spec) => spec.name === error.field);
      return known
        ? { state: 'refused', fieldErrors: { [error.field]: error.rule }, message: null }
        : { state: 'refused', fieldErrors: {}, message: error.rule };
    }
  }, [calculator, settled, resolve]);
}
