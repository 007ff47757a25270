import { CalcInputError } from '../errors/calc-input-error.js';
import { findUnitFamily } from './custom-unit-families.js';
import { math } from './math-instance.js';
import { normaliseUnitText } from './normalise-unit-text.js';

/** What a conversion needs to know about the input it converts. */
export interface ConversionTarget {
  /** Input name, reported in errors. */
  readonly field: string;
  /** Calculator or function that converts, reported in errors. */
  readonly where: string;
  /** The unit the calculator declares for the input. */
  readonly declaredUnit: string;
  /**
   * True when the input is a temperature difference (a warming, a sensitivity): then 3 °C
   * means 3 K, not 276.15 K.
   */
  readonly temperatureDifference?: boolean;
}

// Temperature scales with an offset, read as the same-sized scale without one, for
// differences: a change of 1 °C is a change of 1 K, a change of 1 °F one of 1 °R.
const differenceUnitRewrites: readonly (readonly [RegExp, string])[] = [
  [/\b(?:degC|celsius)\b/g, 'K'],
  [/\b(?:degF|fahrenheit)\b/g, 'degR'],
];

function incompatible(target: ConversionTarget, unit: string, reason: string): CalcInputError {
  const declared = target.declaredUnit === '' ? 'no unit (a plain number)' : target.declaredUnit;
  return new CalcInputError(
    target.field,
    `${target.field} must be given in ${declared} or a compatible unit: "${unit}" ${reason}`,
    target.where,
  );
}

/**
 * Converts a value given in `unit` to the input's declared unit: with mathjs for physical
 * units, with the library's own families for ppm/ppb, GtC/GtCO2 and the TCRE unit.
 *
 * @param value the number as given
 * @param unit the unit it is given in
 * @param target the input it is for
 * @returns the value in the declared unit
 * @throws {CalcInputError} when the unit is unknown or measures something else
 * @example
 * convertQuantity(1.361, 'kW/m^2', { field: 'solarIrradiance', where: 'energy-balance', declaredUnit: 'W/m^2' })
 * // => 1361
 * convertQuantity(15, 'degC', { field: 'targetSurfaceTemperature', where: 'layer-atmosphere', declaredUnit: 'K' })
 * // => 288.15
 */
export function convertQuantity(value: number, unit: string, target: ConversionTarget): number {
  const given = normaliseUnitText(unit);
  const declared = normaliseUnitText(target.declaredUnit);
  if (given === declared) return value;

  const declaredFamily = findUnitFamily(declared);
  const givenFamily = findUnitFamily(given);
  if (declaredFamily !== undefined || givenFamily !== undefined) {
    if (declaredFamily === undefined || givenFamily !== declaredFamily) {
      throw incompatible(target, unit, 'measures something else');
    }
    const givenSize = declaredFamily.units[given] ?? Number.NaN;
    const declaredSize = declaredFamily.units[declared] ?? Number.NaN;
    return (value * givenSize) / declaredSize;
  }

  let mathUnit = given;
  if (target.temperatureDifference === true) {
    for (const [pattern, replacement] of differenceUnitRewrites) {
      mathUnit = mathUnit.replace(pattern, replacement);
    }
  }
  let converted: number;
  try {
    const quantity = math.unit(value, mathUnit);
    if (!quantity.equalBase(math.unit(declared))) {
      throw incompatible(target, unit, 'measures something else');
    }
    converted = quantity.toNumber(declared);
  } catch (error) {
    if (error instanceof CalcInputError) throw error;
    throw incompatible(target, unit, 'is not a unit the library knows');
  }
  if (!Number.isFinite(converted)) {
    throw new CalcInputError(target.field, `${target.field} must be a finite number`, target.where);
  }
  return converted;
}
