import { CalcInputError } from './calc-input-error.js';

/**
 * Throws a {@link CalcInputError} unless `value` is a finite number within [minimum, maximum].
 * Formula functions call it so that they refuse bad input rather than return NaN.
 *
 * @param value the value to check
 * @param field the parameter name reported in the error
 * @param minimum smallest allowed value (inclusive)
 * @param maximum largest allowed value (inclusive)
 * @param where the function or calculator that checks
 * @param unit the unit shown in the rule, if any
 * @throws {CalcInputError} when the value is not finite or out of range
 */
export function requireInRange(
  value: number,
  field: string,
  minimum: number,
  maximum: number,
  where: string,
  unit = '',
): void {
  const unitText = unit === '' ? '' : ` ${unit}`;
  if (typeof value !== 'number' || !Number.isFinite(value)) {
    throw new CalcInputError(field, `${field} must be a finite number`, where);
  }
  if (value < minimum || value > maximum) {
    throw new CalcInputError(
      field,
      `${field} must be between ${minimum} and ${maximum}${unitText}`,
      where,
    );
  }
}

/**
 * Throws a {@link CalcInputError} unless `value` is a finite number greater than zero.
 *
 * @throws {CalcInputError} when the value is not finite or not positive
 */
export function requirePositive(value: number, field: string, where: string): void {
  if (typeof value !== 'number' || !Number.isFinite(value)) {
    throw new CalcInputError(field, `${field} must be a finite number`, where);
  }
  if (value <= 0) {
    throw new CalcInputError(field, `${field} must be greater than 0`, where);
  }
}
