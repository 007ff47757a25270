import { requireInRange } from '../errors/require-finite.js';

/**
 * Surface temperature under one gray layer of emissivity ε, in closed form. The layer
 * takes Tₛ / 2^(1/4) for any ε.
 *
 * Formula: Tₛ = Tₑ (2 / (2 − ε))^(1/4)
 *
 * @param effectiveTemperature Tₑ in K (≥ 0)
 * @param layerEmissivity ε, 0–1
 * @returns Tₛ in K
 * @throws {CalcInputError} when an input is out of range
 * @example
 * oneLayerSurfaceTemperature(255, 1) // ≈ 303.25 (2^(1/4) × 255)
 * @see Archer2012 (chapter 3)
 */
export function oneLayerSurfaceTemperature(
  effectiveTemperature: number,
  layerEmissivity: number,
): number {
  requireInRange(
    effectiveTemperature,
    'effectiveTemperature',
    0,
    10000,
    'oneLayerSurfaceTemperature',
    'K',
  );
  requireInRange(layerEmissivity, 'layerEmissivity', 0, 1, 'oneLayerSurfaceTemperature');
  return effectiveTemperature * (2 / (2 - layerEmissivity)) ** 0.25;
}
