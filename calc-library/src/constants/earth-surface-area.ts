import { earthMeanRadius } from './earth-constants.js';
import { type PhysicalConstant } from './physical-constant.js';

/**
 * Surface area of a sphere.
 *
 * Formula: A = 4 π R²
 *
 * @param radius the sphere's radius, in m (≥ 0)
 * @returns the area in m²
 * @example
 * sphereSurfaceArea(1) // => 12.566370614359172
 */
export function sphereSurfaceArea(radius: number): number {
  return 4 * Math.PI * radius ** 2;
}

export const earthSurfaceArea: PhysicalConstant = {
  key: 'earth_surface_area',
  name: "Earth's surface area (sphere of the mean radius)",
  value: sphereSurfaceArea(earthMeanRadius.value),
  unit: 'm^2',
  source: 'Moritz2000',
  derivedFrom: [earthMeanRadius.key],
  formula: 'A = 4 π R1²',
  note: 'Within 1 part in 10⁶ of the GRS80 ellipsoid area (5.100 656 × 10¹⁴ m²).',
};
