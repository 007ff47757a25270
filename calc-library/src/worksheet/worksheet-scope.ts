import { constants } from '../constants/constants-table.js';
import { type PhysicalConstant } from '../constants/physical-constant.js';
import { type Unit } from 'mathjs';
import { math } from '../units/math-instance.js';

/** A value the worksheet can hold: a plain number or a mathjs quantity. */
export type WorksheetValue = number | Unit;

function asWorksheetValue(constant: PhysicalConstant): WorksheetValue | undefined {
  if (constant.unit === '') return constant.value;
  try {
    return math.unit(constant.value, constant.unit);
  } catch {
    // Units mathjs does not know (GtC/ppm, K per 1000 GtCO2) are left out of the worksheet.
    return undefined;
  }
}

/**
 * The named constants the worksheet offers, by their table keys (`stefan_boltzmann`,
 * `earth_surface_area`, …), each with its unit where mathjs knows it.
 *
 * @returns a fresh map, so that one worksheet's variables never leak into another's
 */
export function worksheetConstants(): Map<string, WorksheetValue> {
  const scope = new Map<string, WorksheetValue>();
  for (const constant of constants) {
    const value = asWorksheetValue(constant);
    if (value !== undefined) scope.set(constant.key, value);
  }
  return scope;
}

/** Keys of the constants the worksheet offers. */
export function worksheetConstantNames(): string[] {
  return [...worksheetConstants().keys()];
}
