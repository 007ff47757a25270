import { requireInRange } from '../errors/require-finite.js';

/**
 * Forcing of a change of the planet's albedo at fixed sunlight: a brighter planet reflects
 * more and absorbs less.
 *
 * Formula: ΔF = −Δα S / 4
 *
 * @param albedoChange Δα, dimensionless (−0.5 to 0.5)
 * @param solarIrradiance S in W/m² (0–100 000)
 * @returns ΔF in W/m²
 * @throws {CalcInputError} when an input is out of range
 * @example
 * albedoChangeForcing(0.01, 1360.8) // ≈ -3.402
 * @see Pierrehumbert2010 (chapter 3)
 */
export function albedoChangeForcing(albedoChange: number, solarIrradiance: number): number {
  requireInRange(albedoChange, 'albedoChange', -0.5, 0.5, 'albedoChangeForcing');
  requireInRange(solarIrradiance, 'solarIrradiance', 0, 100000, 'albedoChangeForcing', 'W/m^2');
  return (-albedoChange * solarIrradiance) / 4;
}
