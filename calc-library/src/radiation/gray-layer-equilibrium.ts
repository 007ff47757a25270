import { stefanBoltzmannConstant } from '../constants/stefan-boltzmann-constant.js';
import { CalcInputError } from '../errors/calc-input-error.js';
import { requireInRange } from '../errors/require-finite.js';
import { solveLinearSystemInPlace } from '../linear-algebra/solve-linear-system.js';

/** Radiative equilibrium of a surface under N gray layers. */
export interface GrayLayerEquilibrium {
  /** σ Tₛ⁴, the surface's emission, in W/m². */
  readonly surfaceEmission: number;
  /** Tₛ in K. */
  readonly surfaceTemperature: number;
  /** Layer temperatures in K, top layer first. */
  readonly layerTemperatures: number[];
}

// The most layers the model takes, and buffers for the largest system, reused by every
// solve so that a Monte Carlo band allocates nothing per sample.
const maximumLayers = 10;
const systemMatrix = new Float64Array((maximumLayers + 1) ** 2);
const systemRightHandSide = new Float64Array(maximumLayers + 1);
const transmissionPowers = new Float64Array(maximumLayers + 1);

// The last solution, since a band over sunlight or albedo asks for the same N and ε again.
let cachedLayers = -1;
let cachedEmissivity = Number.NaN;
let cachedEmissions = new Float64Array(0);

/**
 * The surface emission per unit absorbed flux, σTₛ⁴/F, and each layer's σTᵢ⁴/F (bottom
 * first, at index 1 … N), for N layers of emissivity ε. It depends on N and ε only.
 *
 * Unknowns xₛ = σTₛ⁴ and xᵢ = σTᵢ⁴ (i = 1 … N from the bottom), F = absorbed sunlight. Each
 * layer absorbs the share ε of the infrared reaching it and passes 1 − ε on; it emits ε xᵢ
 * upwards and as much downwards. Radiation from layer j reaches layer i after crossing the
 * |i − j| − 1 layers between them. Sunlight passes the layers and heats the surface.
 *   surface:  xₛ − Σⱼ ε (1 − ε)^(j−1) xⱼ = F
 *   layer i:  (1 − ε)^(i−1) xₛ + Σⱼ≠ᵢ ε (1 − ε)^(|i−j|−1) xⱼ − 2 xᵢ = 0
 * (the layer equation is the balance ε × incoming = 2 ε xᵢ divided by ε, so it also holds as
 * ε → 0, where the layers take the skin temperature Tₛ / 2^(1/4)).
 */
function normalisedEmissions(layers: number, layerEmissivity: number): Float64Array {
  if (layers === cachedLayers && layerEmissivity === cachedEmissivity) return cachedEmissions;
  const size = layers + 1;
  const transmission = 1 - layerEmissivity;
  transmissionPowers[0] = 1;
  for (let power = 1; power < size; power += 1) {
    transmissionPowers[power] = (transmissionPowers[power - 1] ?? 0) * transmission;
  }
  // Surface row.
  systemMatrix[0] = 1;
  for (let layer = 1; layer <= layers; layer += 1) {
    systemMatrix[layer] = -layerEmissivity * (transmissionPowers[layer - 1] ?? 0);
  }
  systemRightHandSide[0] = 1;
  // One row per layer.
  for (let layer = 1; layer <= layers; layer += 1) {
    const rowStart = layer * size;
    systemMatrix[rowStart] = transmissionPowers[layer - 1] ?? 0;
    for (let other = 1; other <= layers; other += 1) {
      systemMatrix[rowStart + other] =
        other === layer
          ? -2
          : layerEmissivity * (transmissionPowers[Math.abs(layer - other) - 1] ?? 0);
    }
    systemRightHandSide[layer] = 0;
  }
  solveLinearSystemInPlace(systemMatrix, systemRightHandSide, size);
  cachedLayers = layers;
  cachedEmissivity = layerEmissivity;
  cachedEmissions = systemRightHandSide.slice(0, size);
  return cachedEmissions;
}

/**
 * Surface emission per unit of absorbed sunlight, σTₛ⁴ / F, of the gray-layer model; it
 * depends on N and ε only. (N + 1 for black layers, 2/(2 − ε) for one layer.)
 *
 * @param layers N, a whole number from 1 to 10
 * @param layerEmissivity ε, 0–1
 * @returns σTₛ⁴ / F (dimensionless, ≥ 1)
 * @throws {CalcInputError} when an input is out of range
 * @example
 * surfaceEmissionPerAbsorbedFlux(3, 1) // ≈ 4
 * @see Archer2012 (chapter 3)
 */
export function surfaceEmissionPerAbsorbedFlux(layers: number, layerEmissivity: number): number {
  requireInRange(layers, 'layers', 1, maximumLayers, 'surfaceEmissionPerAbsorbedFlux');
  requireInRange(layerEmissivity, 'layerEmissivity', 0, 1, 'surfaceEmissionPerAbsorbedFlux');
  if (!Number.isInteger(layers)) {
    throw new CalcInputError(
      'layers',
      'layers must be a whole number from 1 to 10',
      'surfaceEmissionPerAbsorbedFlux',
    );
  }
  return normalisedEmissions(layers, layerEmissivity)[0] ?? Number.NaN;
}

function temperatureOfEmission(emission: number): number {
  return (emission / stefanBoltzmannConstant.value) ** 0.25;
}

/** Inputs of {@link grayLayerEquilibrium}. */
export interface GrayLayerInputs {
  /** F, sunlight absorbed at the surface per unit area, in W/m² (≥ 0). */
  readonly absorbedFlux: number;
  /** N, number of layers, a whole number from 1 to 10. */
  readonly layers: number;
  /** ε, infrared emissivity (= absorptivity) of each layer, 0–1. */
  readonly layerEmissivity: number;
}

/**
 * Surface and layer temperatures of the gray-layer (layer) model: a surface that absorbs
 * the sunlight, under N layers transparent to sunlight that absorb and emit infrared with
 * emissivity ε. Solves the radiative-equilibrium linear system (see the source for the
 * equations); for ε = 1 it gives Tₛ = (N + 1)^(1/4) Tₑ, for one layer Tₛ = Tₑ (2/(2 − ε))^(1/4).
 *
 * Formula: A x = (F, 0, …, 0), x = (σTₛ⁴, σT₁⁴, …, σT_N⁴); T = (x/σ)^(1/4)
 *
 * @returns the surface emission (W/m²), surface temperature (K) and layer temperatures
 *   (K, top layer first)
 * @throws {CalcInputError} when an input is out of range
 * @example
 * grayLayerEquilibrium({ absorbedFlux: 238.175, layers: 1, layerEmissivity: 1 }).surfaceTemperature
 * // ≈ 302.75 (2^(1/4) × 254.58)
 * @see Archer2012 (chapter 3), Pierrehumbert2010 (chapter 3)
 */
export function grayLayerEquilibrium({
  absorbedFlux,
  layers,
  layerEmissivity,
}: GrayLayerInputs): GrayLayerEquilibrium {
  requireInRange(absorbedFlux, 'absorbedFlux', 0, 100000, 'grayLayerEquilibrium', 'W/m^2');
  requireInRange(layers, 'layers', 1, 10, 'grayLayerEquilibrium');
  requireInRange(layerEmissivity, 'layerEmissivity', 0, 1, 'grayLayerEquilibrium');
  if (!Number.isInteger(layers)) {
    throw new CalcInputError(
      'layers',
      'layers must be a whole number from 1 to 10',
      'grayLayerEquilibrium',
    );
  }
  const wholeLayers = layers;
  const emissions = normalisedEmissions(wholeLayers, layerEmissivity);
  const surfaceEmission = (emissions[0] ?? 0) * absorbedFlux;
  const layerTemperatures: number[] = [];
  for (let layer = wholeLayers; layer >= 1; layer -= 1) {
    layerTemperatures.push(temperatureOfEmission((emissions[layer] ?? 0) * absorbedFlux));
  }
  return {
    surfaceEmission,
    surfaceTemperature: temperatureOfEmission(surfaceEmission),
    layerTemperatures,
  };
}
