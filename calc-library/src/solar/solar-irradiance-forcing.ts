import { requireInRange } from '../errors/require-finite.js';

/**
 * Forcing of a change of total solar irradiance: the change of absorbed sunlight,
 * averaged over the sphere. Instantaneous forcing at the top of the atmosphere; AR6
 * estimates the solar ERF with its own adjustments, which this does not apply.
 *
 * Formula: ΔF = ΔS (1 − α) / 4
 *
 * @param irradianceChange ΔS in W/m² (−100 to 100)
 * @param albedo α, Bond albedo (0–1)
 * @returns ΔF in W/m²
 * @throws {CalcInputError} when an input is out of range
 * @example
 * solarIrradianceForcing(1, 0.3) // => 0.175
 * @see Forster2021 (section 7.3.4), Kopp2011
 */
export function solarIrradianceForcing(irradianceChange: number, albedo: number): number {
  requireInRange(
    irradianceChange,
    'irradianceChange',
    -100,
    100,
    'solarIrradianceForcing',
    'W/m^2',
  );
  requireInRange(albedo, 'albedo', 0, 1, 'solarIrradianceForcing');
  return (irradianceChange * (1 - albedo)) / 4;
}
