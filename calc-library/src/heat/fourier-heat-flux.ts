import { requireInRange } from '../errors/require-finite.js';

/**
 * Conductive heat flux through rock by Fourier's law, for a temperature that rises with
 * depth (the flux then runs upwards, out of the Earth).
 *
 * Formula: q = k dT/dz
 *
 * @param conductivity k, thermal conductivity, in W/(m K) (0–1000)
 * @param gradient dT/dz, temperature increase per depth, in K/m (0–10)
 * @returns q in W/m²
 * @throws {CalcInputError} when an input is out of range
 * @example
 * fourierHeatFlux(2.5, 0.025) // => 0.0625
 * @see Turcotte2014 (chapter 4)
 */
export function fourierHeatFlux(conductivity: number, gradient: number): number {
  requireInRange(conductivity, 'conductivity', 0, 1000, 'fourierHeatFlux', 'W/(m K)');
  requireInRange(gradient, 'gradient', 0, 10, 'fourierHeatFlux', 'K/m');
  return conductivity * gradient;
}
