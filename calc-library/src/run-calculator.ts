import { assembleOutputs } from './calculator/assemble-outputs.js';
import { describeCalculator } from './calculator/define-calculator.js';
import { monteCarloBands } from './calculator/monte-carlo-band.js';
import { normaliseInputs } from './calculator/normalise-inputs.js';
import { readRunOptions } from './calculator/run-options.js';
import { step } from './calculator/step.js';
import {
  type AcceptedInputs,
  type CalculatorDefinition,
  type CalculatorInfo,
  type CalculatorResultOf,
  type EvaluateContext,
  type InputSpec,
  type InputValues,
  type NormalisedInputs,
  type OutputKind,
  type RawOutputs,
  type RunOptions,
  type TableColumn,
} from './calculator/types.js';
import { calculatorDefinitions, calculatorIds, type CalculatorId } from './calculators/registry.js';
import { CalcInputError } from './errors/calc-input-error.js';
import { formatNumber } from './format/format-number.js';
import { libraryVersion } from './version.js';

type DefinitionOf<Id extends CalculatorId> = (typeof calculatorDefinitions)[Id];
type SpecsOf<Id extends CalculatorId> = DefinitionOf<Id>['inputs'];
type RawOf<Id extends CalculatorId> = ReturnType<DefinitionOf<Id>['evaluate']>;

/** The inputs a caller may pass to calculator `Id`. */
export type CalculatorInputs<Id extends CalculatorId> = AcceptedInputs<SpecsOf<Id>>;

/** The result of calculator `Id`, with its outputs typed by name. */
export type CalculatorResult<Id extends CalculatorId> = CalculatorResultOf<
  Id,
  SpecsOf<Id>,
  RawOf<Id>
>;

/** The result of any calculator: a union discriminated by `calculatorId`. */
export type AnyCalculatorResult = { [Id in CalculatorId]: CalculatorResult<Id> }[CalculatorId];

/**
 * What `runCalculator(id, …)` accepts: the typed inputs of a known id, or any named inputs
 * when the id is only known at run time (from the API). One signature rather than
 * overloads, because overload resolution tries a stricter relation first and would fall
 * through to the untyped form for some valid inputs.
 */
export type InputsFor<Id extends string> = Id extends CalculatorId
  ? NoInfer<CalculatorInputs<Id>>
  : Readonly<Record<string, unknown>>;

/** What `runCalculator(id, …)` returns: the typed result of a known id, or the union. */
export type ResultFor<Id extends string> = Id extends CalculatorId
  ? CalculatorResult<Id>
  : AnyCalculatorResult;

/** Every calculator's description, for forms and for the API: no functions, JSON-safe. */
export const calculators: readonly CalculatorInfo[] = calculatorIds.map((id) =>
  describeCalculator(calculatorDefinitions[id]),
);

/** True when `id` is the id of a calculator. */
export function isCalculatorId(id: string): id is CalculatorId {
  return Object.hasOwn(calculatorDefinitions, id);
}

type ErasedDefinition = CalculatorDefinition<string, readonly InputSpec[], RawOutputs>;

interface ErasedOutputSpec {
  readonly kind: OutputKind;
  readonly unit: string;
  readonly columns?: readonly TableColumn[];
}

function runDefinition(
  definition: ErasedDefinition,
  inputs: unknown,
  options: RunOptions | undefined,
): CalculatorResultOf<string, readonly InputSpec[], RawOutputs> {
  const where = definition.id;
  const { samples, seed } = readRunOptions(options, where);
  const call = normaliseInputs(definition.inputs, inputs, where);
  const context: EvaluateContext = { provided: call.provided };
  // The normalised values have the shape the declarations promise; the cast is where the
  // run-time checks of normaliseInputs meet the compile-time types.
  const values = call.values as InputValues<readonly InputSpec[]>;
  const central = definition.evaluate(values, context);
  const steps = definition.explain(values, central, context);
  const bands =
    call.ranged.length === 0
      ? undefined
      : monteCarloBands(
          (sample) => definition.evaluate(sample as InputValues<readonly InputSpec[]>, context),
          call.values,
          call.ranged,
          central,
          samples,
          seed,
        );
  if (bands !== undefined) {
    steps.push(
      step(
        'Uncertainty band (Monte Carlo)',
        `${formatNumber(samples)} samples, seed ${seed}; ${call.ranged
          .map(
            ({ spec, range }) =>
              `${spec.name} ${range.distribution} ${range.distribution === 'uniform' ? 'over' : 'with 5–95 % range'} ${formatNumber(range.low)} to ${formatNumber(range.high)}`,
          )
          .join('; ')}`,
        '5th, 50th and 95th percentiles of each output',
      ),
    );
  }
  const placeholders = definition.unitPlaceholders?.(values) ?? {};
  const outputs = assembleOutputs(
    definition.outputs as Readonly<Record<string, ErasedOutputSpec>>,
    central,
    bands,
    placeholders,
    where,
  );
  const cautions = [...definition.cautions, ...(definition.extraCautions?.(values, central) ?? [])];
  return {
    calculatorId: definition.id,
    libraryVersion,
    inputs: call.recorded as NormalisedInputs<readonly InputSpec[]>,
    outputs: outputs as CalculatorResultOf<string, readonly InputSpec[], RawOutputs>['outputs'],
    steps,
    cautions,
    ...(bands === undefined
      ? {}
      : {
          monteCarlo: {
            samples,
            seed,
            rangedInputs: call.ranged.map(({ spec }) => spec.name),
          },
        }),
  };
}

/**
 * Runs a calculator. Inputs are numbers in the declared unit, `{ value, unit }` in any
 * compatible unit, `{ low, high }` ranges (optionally with `unit` and `distribution`),
 * strings for choices, and arrays for series and lines; missing inputs take their
 * defaults. When an input is a range, number outputs get a `band` from a seeded Monte
 * Carlo (`options.samples`, default 10 000; `options.seed`, fixed by default).
 *
 * @param id the calculator's id (see `calculators`)
 * @param inputs the inputs by name
 * @param options Monte Carlo options
 * @returns the result: normalised inputs, outputs with units (and bands), steps, cautions
 * @throws {CalcInputError} for an unknown calculator, an unknown input, an input out of
 *   range, an incompatible unit or a too-short series
 * @example
 * runCalculator('energy-balance', { solarIrradiance: 1361, albedo: 0.3 })
 *   .outputs.effectiveTemperature // ≈ { kind: 'number', value: 254.58, unit: 'K' }
 */
export function runCalculator<Id extends string>(
  id: Id,
  inputs?: InputsFor<Id>,
  options?: RunOptions,
): ResultFor<Id> {
  if (typeof id !== 'string' || !isCalculatorId(id)) {
    throw new CalcInputError(
      'calculatorId',
      `calculatorId must be one of ${calculatorIds.join(', ')}`,
      'runCalculator',
    );
  }
  const definition = calculatorDefinitions[id] as unknown as ErasedDefinition;
  return runDefinition(definition, inputs, options) as unknown as ResultFor<Id>;
}
