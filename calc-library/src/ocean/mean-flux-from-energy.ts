import { requireInRange } from '../errors/require-finite.js';

/**
 * The mean heat flux that delivers an energy over a time and an area.
 *
 * Formula: q = E / (Δt × A)
 *
 * @param energy E in J (any finite value; negative for a loss)
 * @param duration Δt in s (> 0)
 * @param area A in m² (> 0)
 * @returns q in W/m²
 * @throws {CalcInputError} when an input is out of range
 * @example
 * meanFluxFromEnergy(1.6e22, 3.15576e7, 5.1e14) // ≈ 0.994
 * @see Forster2021 (section 7.2.2)
 */
export function meanFluxFromEnergy(energy: number, duration: number, area: number): number {
  requireInRange(energy, 'energy', -Number.MAX_VALUE, Number.MAX_VALUE, 'meanFluxFromEnergy', 'J');
  requireInRange(
    duration,
    'duration',
    Number.MIN_VALUE,
    Number.MAX_VALUE,
    'meanFluxFromEnergy',
    's',
  );
  requireInRange(area, 'area', Number.MIN_VALUE, Number.MAX_VALUE, 'meanFluxFromEnergy', 'm^2');
  return energy / (duration * area);
}
