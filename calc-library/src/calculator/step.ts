import { formatNumber, formatQuantity } from '../format/format-number.js';
import { displayUnit } from '../units/display-unit.js';
import { type Step } from './types.js';

/** One step of a derivation: what is computed, the formula with numbers, the result. */
export function step(text: string, formula: string, result: string): Step {
  return { text, formula, result };
}

/** A number for a formula line (4 significant digits unless told). */
export function shown(value: number, significantDigits = 4): string {
  return formatNumber(value, significantDigits);
}

/** A number with its unit for a result (unit in mathjs notation, shown with superscripts). */
export function shownQuantity(value: number, unit: string, significantDigits = 4): string {
  return formatQuantity(value, displayUnit(unit), significantDigits);
}
