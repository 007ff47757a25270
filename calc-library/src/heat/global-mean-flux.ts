import { requireInRange } from '../errors/require-finite.js';

/**
 * A power spread evenly over an area: the mean flux a global heat flow amounts to.
 *
 * Formula: q = P / A
 *
 * @param power P in W (≥ 0)
 * @param area A in m² (> 0)
 * @returns q in W/m²
 * @throws {CalcInputError} when an input is out of range
 * @example
 * globalMeanFlux(47e12, 5.1e14) // ≈ 0.0922
 * @see Davies2010, Pollack1993
 */
export function globalMeanFlux(power: number, area: number): number {
  requireInRange(power, 'power', 0, Number.MAX_VALUE, 'globalMeanFlux', 'W');
  requireInRange(area, 'area', Number.MIN_VALUE, Number.MAX_VALUE, 'globalMeanFlux', 'm^2');
  return power / area;
}
