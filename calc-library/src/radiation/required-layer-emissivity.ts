import { CalcInputError } from '../errors/calc-input-error.js';
import { requireInRange } from '../errors/require-finite.js';

/**
 * The emissivity one gray layer needs to hold the surface at a target temperature: the
 * one-layer closed form solved for ε.
 *
 * Formula: ε = 2 (1 − (Tₑ / Tₛ)⁴)
 *
 * @param effectiveTemperature Tₑ in K (> 0)
 * @param targetSurfaceTemperature Tₛ in K, between Tₑ and 2^(1/4) Tₑ
 * @returns ε, 0–1
 * @throws {CalcInputError} when the target cannot be reached with ε in 0–1
 * @example
 * requiredLayerEmissivity(254.58, 288) // ≈ 0.779
 * @see Archer2012 (chapter 3)
 */
export function requiredLayerEmissivity(
  effectiveTemperature: number,
  targetSurfaceTemperature: number,
): number {
  requireInRange(
    effectiveTemperature,
    'effectiveTemperature',
    Number.MIN_VALUE,
    10000,
    'requiredLayerEmissivity',
    'K',
  );
  requireInRange(
    targetSurfaceTemperature,
    'targetSurfaceTemperature',
    Number.MIN_VALUE,
    10000,
    'requiredLayerEmissivity',
    'K',
  );
  const warmest = 2 ** 0.25 * effectiveTemperature;
  if (targetSurfaceTemperature < effectiveTemperature || targetSurfaceTemperature > warmest) {
    throw new CalcInputError(
      'targetSurfaceTemperature',
      `targetSurfaceTemperature must be between ${effectiveTemperature.toFixed(2)} K (no greenhouse effect) ` +
        `and ${warmest.toFixed(2)} K (one black layer) for one gray layer to reach it`,
      'requiredLayerEmissivity',
    );
  }
  return 2 * (1 - (effectiveTemperature / targetSurfaceTemperature) ** 4);
}
