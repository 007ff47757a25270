import { describe, it } from 'vitest';
import { expectCalcInputError } from '../../test/expect-calc-input-error.js';
import { expectClose } from '../../test/expect-close.js';
import { earthSurfaceArea } from '../constants/earth-surface-area.js';
import { secondsPerYear } from '../constants/time-constants.js';
import { meanFluxFromEnergy } from './mean-flux-from-energy.js';
import { waterLayerWarming } from './water-layer-warming.js';

const zettajoule = 1e21;

describe('meanFluxFromEnergy', () => {
  it('reproduces the AR6 heating rates of the Earth system', () => {
    // from memory: IPCC AR6 WG1 Table 7.1: 152 ZJ gained 2006–2018 is a heating rate of 0.79 W/m² (over 12 years)
    expectClose(
      meanFluxFromEnergy(152 * zettajoule, 12 * secondsPerYear.value, earthSurfaceArea.value),
      0.79,
      { abs: 0.01 },
    );
    // from memory: IPCC AR6 WG1 Table 7.1: 435 ZJ gained 1971–2018 is 0.57 W/m² (over 47 years)
    expectClose(
      meanFluxFromEnergy(435 * zettajoule, 47 * secondsPerYear.value, earthSurfaceArea.value),
      0.57,
      { abs: 0.01 },
    );
  });

  it('follows the rule of thumb that 1 W/m² for a year is about 16 ZJ', () => {
    // common practice, no source: 1 W/m² over the whole Earth for one year ≈ 16 ZJ
    expectClose(
      meanFluxFromEnergy(16.1 * zettajoule, secondsPerYear.value, earthSurfaceArea.value),
      1,
      { abs: 0.01 },
    );
  });

  it('refuses a zero duration or area', () => {
    expectCalcInputError(() => meanFluxFromEnergy(1, 0, 1), 'duration');
    expectCalcInputError(() => meanFluxFromEnergy(1, 1, 0), 'area');
  });
});

describe('waterLayerWarming', () => {
  it('is the energy over the heat capacity of the layer', () => {
    // 1 m³ of water with ρ c_p = 1025 × 3991.87 J/(m³ K) warms by 1 K for that many joules
    expectClose(
      waterLayerWarming({
        energy: 1025 * 3991.87,
        depth: 1,
        area: 1,
        density: 1025,
        specificHeat: 3991.87,
      }),
      1,
      { rel: 1e-12 },
    );
  });

  it('refuses a layer deeper than the ocean', () => {
    expectCalcInputError(
      () =>
        waterLayerWarming({ energy: 1, depth: 20000, area: 1, density: 1025, specificHeat: 3992 }),
      'depth',
    );
  });
});
