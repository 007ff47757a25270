import { requireInRange } from '../errors/require-finite.js';

/**
 * Warming from cumulative CO2 emissions by the transient climate response to cumulative
 * emissions (TCRE): warming grows almost in proportion to the total CO2 emitted.
 *
 * Formula: ΔT = TCRE × E / 1000
 *
 * @param cumulativeEmissions E in GtCO2 (−100 000 to 100 000)
 * @param tcre TCRE in K per 1000 GtCO2 (0–5)
 * @returns ΔT in K
 * @throws {CalcInputError} when an input is out of range
 * @example
 * warmingFromCumulativeEmissions(1000, 0.45) // => 0.45
 * @see IPCC2021 (SPM D.1.1)
 */
export function warmingFromCumulativeEmissions(cumulativeEmissions: number, tcre: number): number {
  requireInRange(
    cumulativeEmissions,
    'cumulativeEmissions',
    -100000,
    100000,
    'warmingFromCumulativeEmissions',
    'GtCO2',
  );
  requireInRange(tcre, 'tcre', 0, 5, 'warmingFromCumulativeEmissions', 'K per 1000 GtCO2');
  return (tcre * cumulativeEmissions) / 1000;
}
