import { requireInRange } from '../errors/require-finite.js';

// Etminan et al. (2016), Table 1, CO2 row.
const quadraticCoefficient = -2.4e-7; // a₁, W m⁻² ppm⁻²
const linearCoefficient = 7.2e-4; // b₁, W m⁻² ppm⁻¹
const n2oCoefficient = -2.1e-4; // c₁, W m⁻² ppb⁻¹
const logarithmicCoefficient = 5.36; // W m⁻²

/** Inputs of {@link etminan2016Co2Forcing}. */
export interface Etminan2016Co2Inputs {
  /** C, in ppm. */
  readonly co2: number;
  /** C₀, in ppm. */
  readonly co2Reference: number;
  /** N, in ppb (its mean with N₀ enters the overlap). */
  readonly n2o: number;
  /** N₀, in ppb. */
  readonly n2oReference: number;
}

/**
 * Stratospheric-adjusted radiative forcing of CO2 by Etminan et al. (2016), with the CO2–N2O
 * overlap. Fitted for 180–2000 ppm CO2.
 *
 * Formula: ΔF = [a₁ (C − C₀)² + b₁ |C − C₀| + c₁ N̄ + 5.36] ln(C / C₀), N̄ = (N + N₀)/2
 *
 * @returns ΔF in W/m²
 * @throws {CalcInputError} when a concentration is not positive
 * @example
 * etminan2016Co2Forcing({ co2: 556, co2Reference: 278, n2o: 270, n2oReference: 270 }) // ≈ 3.80
 * @see Etminan2016 (Table 1)
 */
export function etminan2016Co2Forcing({
  co2,
  co2Reference,
  n2o,
  n2oReference,
}: Etminan2016Co2Inputs): number {
  requireInRange(co2, 'co2', Number.MIN_VALUE, 1e6, 'etminan2016Co2Forcing', 'ppm');
  requireInRange(
    co2Reference,
    'co2Reference',
    Number.MIN_VALUE,
    1e6,
    'etminan2016Co2Forcing',
    'ppm',
  );
  requireInRange(n2o, 'n2o', Number.MIN_VALUE, 1e7, 'etminan2016Co2Forcing', 'ppb');
  requireInRange(
    n2oReference,
    'n2oReference',
    Number.MIN_VALUE,
    1e7,
    'etminan2016Co2Forcing',
    'ppb',
  );
  const change = co2 - co2Reference;
  const meanN2o = (n2o + n2oReference) / 2;
  return (
    (quadraticCoefficient * change ** 2 +
      linearCoefficient * Math.abs(change) +
      n2oCoefficient * meanN2o +
      logarithmicCoefficient) *
    Math.log(co2 / co2Reference)
  );
}
