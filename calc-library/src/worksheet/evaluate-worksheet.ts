import { type MathNode, type Unit } from 'mathjs';
import { formatNumber } from '../format/format-number.js';
import { displayUnit } from '../units/display-unit.js';
import { math } from '../units/math-instance.js';
import { worksheetConstants } from './worksheet-scope.js';

/** The result of one worksheet line: its value and unit, or its error. */
export type WorksheetLineResult =
  | {
      /** Line number, from 1, in the lines as given. */
      line: number;
      expression: string;
      ok: true;
      value: number;
      unit: string;
      /** The value as shown to readers, e.g. `390.1 W/m²`. */
      text: string;
      error: null;
    }
  | {
      line: number;
      expression: string;
      ok: false;
      value: null;
      unit: null;
      text: null;
      error: string;
    };

// Functions a worksheet line may call; everything else on the mathjs instance (matrices,
// internal helpers) stays out of reach.
const allowedFunctions: ReadonlySet<string> = new Set(['sqrt', 'exp', 'log', 'log10', 'abs']);
const allowedNodeTypes: ReadonlySet<string> = new Set([
  'ConstantNode',
  'SymbolNode',
  'OperatorNode',
  'ParenthesisNode',
  'FunctionNode',
  'AssignmentNode',
]);

// Units a result is shown in when its dimension matches, before falling back to SI base
// units; a line that converts with `to` keeps the unit asked for.
const preferredUnits = [
  'W/m^2',
  'W',
  'J',
  'K',
  'm',
  'm^2',
  'm^3',
  's',
  'kg',
  'W/(m^2 K^4)',
  'W/(m^2 K)',
  'W/(m K)',
  'K/m',
  'Pa',
  'kg/m^3',
  'J/(kg K)',
  'J/K',
  'm/s',
  'g/mol',
  'mol',
];

function checkNode(node: MathNode, constantNames: ReadonlySet<string>): void {
  node.traverse((child, _path, parent) => {
    if (!allowedNodeTypes.has(child.type)) {
      throw new Error(`this kind of expression (${child.type}) is not allowed in the worksheet`);
    }
    if (math.isFunctionNode(child)) {
      const name = math.isSymbolNode(child.fn) ? child.fn.name : '';
      if (!allowedFunctions.has(name)) {
        throw new Error(
          `unknown function ${name}(); the worksheet offers ${[...allowedFunctions].join(', ')}`,
        );
      }
    }
    if (math.isAssignmentNode(child)) {
      if (!math.isSymbolNode(child.object)) {
        throw new Error('only a plain name can be assigned, as in x = 3 m');
      }
      if (constantNames.has(child.object.name)) {
        throw new Error(`${child.object.name} is a named constant and cannot be changed`);
      }
      if (parent !== null) throw new Error('an assignment must stand alone on its line');
    }
  });
}

function toQuantity(result: unknown): { value: number; unit: string } {
  if (typeof result === 'number') {
    if (!Number.isFinite(result)) throw new Error('the result is not a finite number');
    return { value: result, unit: '' };
  }
  if (!math.isUnit(result)) {
    throw new Error('the line does not give a number or a quantity with a unit');
  }
  const quantity = result as Unit;
  let unit: string;
  if (quantity.skipAutomaticSimplification) {
    unit = quantity.formatUnits();
  } else {
    const preferred = preferredUnits.find((candidate) => quantity.equalBase(math.unit(candidate)));
    unit = preferred ?? quantity.toSI().formatUnits();
  }
  const value = quantity.value === null ? 1 : quantity.toNumber(unit);
  if (!Number.isFinite(value)) throw new Error('the result is not a finite number');
  return { value, unit: unit.replace(/ \/ /g, '/') };
}

/**
 * Evaluates worksheet lines of arithmetic with units and named constants, one at a time,
 * with mathjs. Later lines can use names assigned on earlier ones (`flux = 240 W/m^2`).
 * A line that fails gives its error and the others go on. Blank lines and lines starting
 * with `#` are skipped.
 *
 * @param lines the lines, as written
 * @returns one result per evaluated line
 * @example
 * evaluateWorksheet(['2 m * 3 m'])[0]?.text // => '6 m²'
 */
export function evaluateWorksheet(lines: readonly string[]): WorksheetLineResult[] {
  const scope = worksheetConstants();
  const constantNames: ReadonlySet<string> = new Set(scope.keys());
  const results: WorksheetLineResult[] = [];
  lines.forEach((rawLine, index) => {
    const expression = rawLine.trim();
    if (expression === '' || expression.startsWith('#')) return;
    try {
      const node = math.parse(expression);
      checkNode(node, constantNames);
      const evaluated: unknown = node.compile().evaluate(scope);
      const { value, unit } = toQuantity(evaluated);
      results.push({
        line: index + 1,
        expression,
        ok: true,
        value,
        unit,
        text:
          unit === '' ? formatNumber(value, 6) : `${formatNumber(value, 6)} ${displayUnit(unit)}`,
        error: null,
      });
    } catch (error) {
      results.push({
        line: index + 1,
        expression,
        ok: false,
        value: null,
        unit: null,
        text: null,
        error: error instanceof Error ? error.message : String(error),
      });
    }
  });
  return results;
}
