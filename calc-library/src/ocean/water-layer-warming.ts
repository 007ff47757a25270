import { requireInRange } from '../errors/require-finite.js';

/** Inputs of {@link waterLayerWarming}. */
export interface WaterLayerInputs {
  /** E, heat added, in J. */
  readonly energy: number;
  /** h, layer depth, in m (> 0). */
  readonly depth: number;
  /** A, layer area, in m² (> 0). */
  readonly area: number;
  /** ρ, density, in kg/m³ (> 0). */
  readonly density: number;
  /** c_p, specific heat, in J/(kg K) (> 0). */
  readonly specificHeat: number;
}

/**
 * Mean warming of a water layer that takes up an energy, if the heat were spread evenly
 * through it.
 *
 * Formula: ΔT = E / (ρ c_p h A)
 *
 * @returns ΔT in K
 * @throws {CalcInputError} when an input is out of range
 * @example
 * waterLayerWarming({ energy: 1e21, depth: 700, area: 3.62e14, density: 1025, specificHeat: 3991.87 })
 * // ≈ 0.000964
 * @see IOC2010 (c_p⁰)
 */
export function waterLayerWarming({
  energy,
  depth,
  area,
  density,
  specificHeat,
}: WaterLayerInputs): number {
  requireInRange(energy, 'energy', -Number.MAX_VALUE, Number.MAX_VALUE, 'waterLayerWarming', 'J');
  requireInRange(depth, 'depth', Number.MIN_VALUE, 12000, 'waterLayerWarming', 'm');
  requireInRange(area, 'area', Number.MIN_VALUE, Number.MAX_VALUE, 'waterLayerWarming', 'm^2');
  requireInRange(
    density,
    'density',
    Number.MIN_VALUE,
    Number.MAX_VALUE,
    'waterLayerWarming',
    'kg/m^3',
  );
  requireInRange(
    specificHeat,
    'specificHeat',
    Number.MIN_VALUE,
    Number.MAX_VALUE,
    'waterLayerWarming',
    'J/(kg K)',
  );
  return energy / (density * specificHeat * depth * area);
}
