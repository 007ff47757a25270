import { co2PerPpmCo2 } from '../constants/carbon-constants.js';
import { requireInRange } from '../errors/require-finite.js';

/**
 * Rise of the CO2 concentration from cumulative emissions, with the share of them that
 * stays in the air (the airborne fraction; the rest goes into the ocean and the land).
 *
 * Formula: ΔC = E × AF / (GtCO2 per ppm), GtCO2 per ppm = 2.124 × 44.009/12.011
 *
 * @param cumulativeEmissions E in GtCO2 (−100 000 to 100 000)
 * @param airborneFraction AF, 0–1
 * @returns ΔC in ppm
 * @throws {CalcInputError} when an input is out of range
 * @example
 * concentrationRiseFromEmissions(1000, 0.44) // ≈ 56.54
 * @see Friedlingstein2022
 */
export function concentrationRiseFromEmissions(
  cumulativeEmissions: number,
  airborneFraction: number,
): number {
  requireInRange(
    cumulativeEmissions,
    'cumulativeEmissions',
    -100000,
    100000,
    'concentrationRiseFromEmissions',
    'GtCO2',
  );
  requireInRange(airborneFraction, 'airborneFraction', 0, 1, 'concentrationRiseFromEmissions');
  return (cumulativeEmissions * airborneFraction) / co2PerPpmCo2.value;
}
