import { CalcInputError } from '../errors/calc-input-error.js';
import { type OutputBands } from './monte-carlo-band.js';
import {
  type Band,
  type CalculatorOutput,
  type ListBand,
  type OutputKind,
  type RawOutputs,
  type TableColumn,
} from './types.js';

interface OutputDeclaration {
  readonly kind: OutputKind;
  readonly unit: string;
  readonly columns?: readonly TableColumn[];
}

function fillUnit(unit: string, placeholders: Readonly<Record<string, string>>): string {
  let filled = unit;
  for (const [placeholder, replacement] of Object.entries(placeholders)) {
    filled = filled.split(placeholder).join(replacement);
  }
  return filled;
}

function requireFinite(value: number, name: string, where: string): void {
  if (!Number.isFinite(value)) {
    throw new CalcInputError(
      'inputs',
      `these inputs give no finite value for ${name}; check that they are physically consistent`,
      where,
    );
  }
}

/**
 * Turns a calculator's raw outputs into result outputs: each with its kind and unit, a band
 * where one was computed, and table columns. Refuses to return a non-finite number.
 *
 * @throws {CalcInputError} when an output is not finite
 */
export function assembleOutputs(
  declarations: Readonly<Record<string, OutputDeclaration>>,
  raw: RawOutputs,
  bands: OutputBands | undefined,
  placeholders: Readonly<Record<string, string>>,
  where: string,
): Record<string, CalculatorOutput> {
  const outputs: Record<string, CalculatorOutput> = {};
  for (const [name, declaration] of Object.entries(declarations)) {
    const value = raw[name];
    if (value === undefined) continue;
    const unit = fillUnit(declaration.unit, placeholders);
    const band = bands?.[name];
    switch (declaration.kind) {
      case 'number': {
        const number = value as number;
        requireFinite(number, name, where);
        outputs[name] = {
          kind: 'number',
          value: number,
          unit,
          ...(band === undefined ? {} : { band: band as Band }),
        };
        break;
      }
      case 'list': {
        const list = value as readonly number[];
        list.forEach((entry) => requireFinite(entry, name, where));
        outputs[name] = {
          kind: 'list',
          value: list,
          unit,
          ...(band === undefined ? {} : { band: band as ListBand }),
        };
        break;
      }
      case 'text':
        outputs[name] = { kind: 'text', value: value as string, unit: '' };
        break;
      case 'table': {
        const rows = value as readonly object[];
        for (const row of rows) {
          for (const cell of Object.values(row)) {
            if (typeof cell === 'number') requireFinite(cell, name, where);
          }
        }
        outputs[name] = {
          kind: 'table',
          value: rows,
          unit: '',
          columns: (declaration.columns ?? []).map((column) => ({
            ...column,
            unit: fillUnit(column.unit, placeholders),
          })),
        };
        break;
      }
    }
  }
  return outputs;
}
