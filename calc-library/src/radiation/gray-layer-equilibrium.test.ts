import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { expectCalcInputError } from '../../test/expect-calc-input-error.js';
import { expectClose } from '../../test/expect-close.js';
import { stefanBoltzmannConstant } from '../constants/stefan-boltzmann-constant.js';
import { blackLayersSurfaceTemperature } from './black-layers-surface-temperature.js';
import { grayLayerEquilibrium, surfaceEmissionPerAbsorbedFlux } from './gray-layer-equilibrium.js';
import { oneLayerSurfaceTemperature } from './one-layer-surface-temperature.js';
import { radiatingTemperature } from './radiating-temperature.js';
import { requiredLayerEmissivity } from './required-layer-emissivity.js';

const absorbedFlux = 238.175; // S = 1361 W/m², α = 0.3
const effective = radiatingTemperature(absorbedFlux);

describe('grayLayerEquilibrium reduces to the textbook closed forms', () => {
  it('matches one layer of any emissivity: Tₛ = Tₑ (2/(2 − ε))^(1/4), layer T = Tₛ / 2^(1/4)', () => {
    for (const layerEmissivity of [0, 0.25, 0.5, 0.78, 0.9, 1]) {
      const result = grayLayerEquilibrium({ absorbedFlux, layers: 1, layerEmissivity });
      // Archer 2012, Global Warming: Understanding the Forecast, ch. 3 (layer model, one gray layer)
      expectClose(
        result.surfaceTemperature,
        oneLayerSurfaceTemperature(effective, layerEmissivity),
        { rel: 1e-12 },
      );
      // Archer 2012, ch. 3: the layer radiates half its emission to the ground, so T_layer = Tₛ / 2^(1/4)
      expectClose(
        result.layerTemperatures[0] ?? Number.NaN,
        result.surfaceTemperature / 2 ** 0.25,
        { rel: 1e-12 },
      );
    }
  });

  it('matches N black layers: Tₛ = (N + 1)^(1/4) Tₑ and layer k from the top at k^(1/4) Tₑ', () => {
    for (let layers = 1; layers <= 10; layers += 1) {
      const result = grayLayerEquilibrium({ absorbedFlux, layers, layerEmissivity: 1 });
      // Pierrehumbert 2010, Principles of Planetary Climate, ch. 3: N black layers give Tₛ⁴ = (N + 1) Tₑ⁴
      expectClose(result.surfaceTemperature, blackLayersSurfaceTemperature(effective, layers), {
        rel: 1e-12,
      });
      result.layerTemperatures.forEach((temperature, index) => {
        // Pierrehumbert 2010, ch. 3: layer k counted from the top has T⁴ = k Tₑ⁴
        expectClose(temperature, (index + 1) ** 0.25 * effective, { rel: 1e-12 });
      });
    }
  });

  it('gives the one-black-layer Earth of the textbook', () => {
    // Archer 2012, ch. 3: one black layer warms the ground by 2^(1/4), from ≈ 255 K to ≈ 303 K
    expectClose(
      grayLayerEquilibrium({ absorbedFlux, layers: 1, layerEmissivity: 1 }).surfaceTemperature,
      2 ** 0.25 * 254.58,
      { abs: 0.01 },
    );
  });
});

describe('grayLayerEquilibrium is in energy balance', () => {
  it('sends out at the top exactly the sunlight the surface absorbs', () => {
    fc.assert(
      fc.property(
        fc.integer({ min: 1, max: 10 }),
        fc.double({ min: 0, max: 1, noNaN: true }),
        (layers, layerEmissivity) => {
          const result = grayLayerEquilibrium({ absorbedFlux, layers, layerEmissivity });
          const emissions = [...result.layerTemperatures]
            .reverse()
            .map((temperature) => stefanBoltzmannConstant.value * temperature ** 4);
          // Upward infrared leaving the top: the surface's share that crosses every layer, plus each layer's upward emission that crosses the layers above it.
          let outgoing = result.surfaceEmission * (1 - layerEmissivity) ** layers;
          emissions.forEach((emission, index) => {
            outgoing += layerEmissivity * emission * (1 - layerEmissivity) ** (layers - 1 - index);
          });
          expectClose(outgoing, absorbedFlux, { rel: 1e-9 });
        },
      ),
    );
  });
});

describe('grayLayerEquilibrium: the surface warms with more absorption', () => {
  it('warms when ε grows', () => {
    fc.assert(
      fc.property(
        fc.integer({ min: 1, max: 10 }),
        fc.double({ min: 0, max: 0.99, noNaN: true }),
        fc.double({ min: 0.001, max: 0.5, noNaN: true }),
        (layers, low, step) => {
          const high = Math.min(1, low + step);
          const cooler = grayLayerEquilibrium({ absorbedFlux, layers, layerEmissivity: low });
          const warmer = grayLayerEquilibrium({ absorbedFlux, layers, layerEmissivity: high });
          expect(warmer.surfaceTemperature).toBeGreaterThan(cooler.surfaceTemperature);
        },
      ),
    );
  });

  it('warms when N grows', () => {
    fc.assert(
      fc.property(
        fc.integer({ min: 1, max: 9 }),
        fc.double({ min: 0.01, max: 1, noNaN: true }),
        (layers, layerEmissivity) => {
          const fewer = surfaceEmissionPerAbsorbedFlux(layers, layerEmissivity);
          const more = surfaceEmissionPerAbsorbedFlux(layers + 1, layerEmissivity);
          expect(more).toBeGreaterThan(fewer);
        },
      ),
    );
  });
});

describe('requiredLayerEmissivity', () => {
  it('inverts the one-layer closed form', () => {
    fc.assert(
      fc.property(fc.double({ min: 0, max: 1, noNaN: true }), (layerEmissivity) => {
        const surface = oneLayerSurfaceTemperature(effective, layerEmissivity);
        expectClose(requiredLayerEmissivity(effective, surface), layerEmissivity, { abs: 1e-9 });
      }),
    );
  });

  it('needs about 0.78 for Earth’s 288 K', () => {
    // common practice, no source: the one-layer model reaches 288 K with ε ≈ 0.78
    expectClose(requiredLayerEmissivity(effective, 288), 0.78, { abs: 0.005 });
  });

  it('refuses targets one layer cannot reach', () => {
    expectCalcInputError(
      () => requiredLayerEmissivity(effective, 250),
      'targetSurfaceTemperature',
      /between/,
    );
    expectCalcInputError(
      () => requiredLayerEmissivity(effective, 310),
      'targetSurfaceTemperature',
      /one black layer/,
    );
  });
});

describe('grayLayerEquilibrium refuses bad input', () => {
  it('names the input and the range', () => {
    expectCalcInputError(
      () => grayLayerEquilibrium({ absorbedFlux, layers: 0, layerEmissivity: 1 }),
      'layers',
      /between 1 and 10/,
    );
    expectCalcInputError(
      () => grayLayerEquilibrium({ absorbedFlux, layers: 11, layerEmissivity: 1 }),
      'layers',
    );
    expectCalcInputError(
      () => grayLayerEquilibrium({ absorbedFlux, layers: 2.5, layerEmissivity: 1 }),
      'layers',
      /whole number/,
    );
    expectCalcInputError(
      () => grayLayerEquilibrium({ absorbedFlux, layers: 1, layerEmissivity: 1.1 }),
      'layerEmissivity',
    );
    expectCalcInputError(
      () => grayLayerEquilibrium({ absorbedFlux: -1, layers: 1, layerEmissivity: 1 }),
      'absorbedFlux',
    );
  });
});
