import { requireInRange } from '../errors/require-finite.js';

/**
 * Sunlight absorbed by a planet, averaged over its whole surface: the disc intercepts
 * S π R², the sphere has area 4 π R², and the fraction α is reflected.
 *
 * Formula: F = S (1 − α) / 4
 *
 * @param solarIrradiance S, total solar irradiance at the planet, in W/m² (0–100 000)
 * @param albedo α, Bond albedo, dimensionless (0–1)
 * @returns F, absorbed flux per unit of planetary surface, in W/m²
 * @throws {CalcInputError} when an input is not finite or out of range
 * @example
 * absorbedSolarFlux(1361, 0.3) // => 238.17499999999998
 * @see Pierrehumbert2010 (chapter 3), Archer2012 (chapter 3)
 */
export function absorbedSolarFlux(solarIrradiance: number, albedo: number): number {
  requireInRange(solarIrradiance, 'solarIrradiance', 0, 100000, 'absorbedSolarFlux', 'W/m^2');
  requireInRange(albedo, 'albedo', 0, 1, 'absorbedSolarFlux');
  return (solarIrradiance * (1 - albedo)) / 4;
}
