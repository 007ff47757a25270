import { requireInRange } from '../errors/require-finite.js';

/**
 * Surface temperature under N layers that are black in the infrared (ε = 1), in closed
 * form; the layer k from the top has Tₑ k^(1/4).
 *
 * Formula: Tₛ = (N + 1)^(1/4) Tₑ
 *
 * @param effectiveTemperature Tₑ in K (≥ 0)
 * @param layers N, a whole number from 1 to 10
 * @returns Tₛ in K
 * @throws {CalcInputError} when an input is out of range
 * @example
 * blackLayersSurfaceTemperature(255, 3) // ≈ 360.62 (4^(1/4) × 255)
 * @see Archer2012 (chapter 3), Pierrehumbert2010 (chapter 3)
 */
export function blackLayersSurfaceTemperature(
  effectiveTemperature: number,
  layers: number,
): number {
  requireInRange(
    effectiveTemperature,
    'effectiveTemperature',
    0,
    10000,
    'blackLayersSurfaceTemperature',
    'K',
  );
  requireInRange(layers, 'layers', 1, 10, 'blackLayersSurfaceTemperature');
  return (Math.round(layers) + 1) ** 0.25 * effectiveTemperature;
}
