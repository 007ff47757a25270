import { carbonPerPpmCo2, co2PerCarbonMassRatio } from '../constants/carbon-constants.js';
import { CalcInputError } from '../errors/calc-input-error.js';

/** One amount of atmospheric CO2 in the three usual units. */
export interface CarbonAmount {
  /** As a change of concentration, in ppm. */
  readonly ppm: number;
  /** As a mass of carbon, in GtC (= PgC). */
  readonly gtc: number;
  /** As a mass of CO2, in GtCO2. */
  readonly gtco2: number;
}

/** The unit an amount is given in. */
export type CarbonAmountUnit = keyof CarbonAmount;

/**
 * Converts an amount of atmospheric CO2 between ppm, GtC and GtCO2 with the Global Carbon
 * Budget factor 2.124 GtC/ppm and the mass ratio M(CO2)/A(C) = 44.009/12.011.
 *
 * Formula: GtC = 2.124 × ppm; GtCO2 = GtC × M(CO2)/A(C)
 *
 * @param amount the amount (finite; negative for a decrease)
 * @param unit the unit it is in: `ppm`, `gtc` or `gtco2`
 * @returns the amount in all three units
 * @throws {CalcInputError} when the amount is not finite
 * @example
 * convertCarbonAmount(1, 'ppm').gtco2 // ≈ 7.7823
 * @see Friedlingstein2022 (section 2.1), Prohaska2022
 */
export function convertCarbonAmount(amount: number, unit: CarbonAmountUnit): CarbonAmount {
  if (!Number.isFinite(amount)) {
    throw new CalcInputError(unit, `${unit} must be a finite number`, 'convertCarbonAmount');
  }
  const gtc =
    unit === 'ppm'
      ? amount * carbonPerPpmCo2.value
      : unit === 'gtc'
        ? amount
        : amount / co2PerCarbonMassRatio.value;
  return {
    ppm: gtc / carbonPerPpmCo2.value,
    gtc,
    gtco2: gtc * co2PerCarbonMassRatio.value,
  };
}
