import { type ReferenceKey } from '../references/bibliography.js';
import {
  type CalculatorDefinition,
  type CalculatorInfo,
  type InputSpec,
  type OutputKind,
  type RawOutputs,
  type TableColumn,
} from './types.js';

/**
 * Declares a calculator. The identity at run time; at compile time it ties the input
 * declarations, the output declarations and the formulas together, so that a missing
 * output declaration or a misspelt input name is a type error.
 *
 * @example
 * const doubling = defineCalculator<'doubling', typeof inputs, { doubled: number }>({ ... });
 */
export function defineCalculator<
  Id extends string,
  const Specs extends readonly InputSpec[],
  Raw extends RawOutputs,
>(definition: CalculatorDefinition<Id, Specs, Raw>): CalculatorDefinition<Id, Specs, Raw> {
  return definition;
}

/** The data of a calculator that its description needs. */
export interface DescribableCalculator {
  readonly id: string;
  readonly title: string;
  readonly summary: string;
  readonly inputs: readonly InputSpec[];
  readonly outputs: Readonly<
    Record<
      string,
      {
        readonly kind: OutputKind;
        readonly label: string;
        readonly unit: string;
        readonly help?: string;
        readonly columns?: readonly TableColumn[];
      }
    >
  >;
  readonly cautions: readonly string[];
  readonly references: readonly ReferenceKey[];
}

/**
 * The serialisable description of a calculator that `calculators` lists: no functions,
 * outputs as an array in display order.
 */
export function describeCalculator(definition: DescribableCalculator): CalculatorInfo {
  return {
    id: definition.id,
    title: definition.title,
    summary: definition.summary,
    inputs: definition.inputs,
    outputs: Object.entries(definition.outputs).map(([name, spec]) => ({
      name,
      kind: spec.kind,
      label: spec.label,
      unit: spec.unit,
      ...(spec.help === undefined ? {} : { help: spec.help }),
      ...(spec.columns === undefined ? {} : { columns: spec.columns }),
    })),
    cautions: definition.cautions,
    references: definition.references,
  };
}
