import { requireInRange } from '../errors/require-finite.js';
import { absorbedSolarFlux } from './absorbed-solar-flux.js';
import { radiatingTemperature } from './radiating-temperature.js';

/** Inputs of {@link effectiveTemperature}. */
export interface EffectiveTemperatureInputs {
  /** S, total solar irradiance, in W/m² (0–100 000). */
  readonly solarIrradiance: number;
  /** α, Bond albedo (0–1). */
  readonly albedo: number;
  /** ε, broadband emissivity of the planet (0.01–1); 1 unless given. */
  readonly emissivity?: number;
}

/**
 * Effective (emission) temperature of a planet in radiative balance: the temperature at
 * which it must radiate to shed the sunlight it absorbs.
 *
 * Formula: Tₑ = (S (1 − α) / (4 ε σ))^(1/4)
 *
 * @returns Tₑ in K
 * @throws {CalcInputError} when an input is not finite or out of range
 * @example
 * effectiveTemperature({ solarIrradiance: 1361, albedo: 0.3 }) // ≈ 254.58
 * @see Pierrehumbert2010 (chapter 3), Tiesinga2021 (σ)
 */
export function effectiveTemperature({
  solarIrradiance,
  albedo,
  emissivity = 1,
}: EffectiveTemperatureInputs): number {
  requireInRange(emissivity, 'emissivity', 0.01, 1, 'effectiveTemperature');
  return radiatingTemperature(absorbedSolarFlux(solarIrradiance, albedo), emissivity);
}
