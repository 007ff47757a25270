import { describe, it } from 'vitest';
import { expectCalcInputError } from '../../test/expect-calc-input-error.js';
import { expectClose } from '../../test/expect-close.js';
import { earthSurfaceArea } from '../constants/earth-surface-area.js';
import { fourierHeatFlux } from './fourier-heat-flux.js';
import { globalMeanFlux } from './global-mean-flux.js';

describe('geothermal heat flow as a global mean flux', () => {
  it('reproduces Pollack et al. (1993)', () => {
    // from memory: Pollack, Hurter & Johnson 1993, Rev. Geophys. 31, 267, abstract: 44.2 TW, global mean 87 mW/m²
    expectClose(globalMeanFlux(44.2e12, earthSurfaceArea.value), 0.087, { abs: 0.0005 });
  });

  it('reproduces Davies & Davies (2010)', () => {
    // from memory: Davies & Davies 2010, Solid Earth 1, 5, abstract: 46.7 TW (47 ± 2 TW), mean 91.6 mW/m²
    expectClose(globalMeanFlux(46.7e12, earthSurfaceArea.value), 0.0916, { abs: 0.0005 });
  });
});

describe('fourierHeatFlux', () => {
  it('gives the flux of typical continental crust', () => {
    // common practice, no source: k = 2.5 W/(m K) and a gradient of 25 K/km give about 60 mW/m²
    expectClose(fourierHeatFlux(2.5, 0.025), 0.0625, { rel: 1e-12 });
  });

  it('refuses inputs out of range', () => {
    expectCalcInputError(() => fourierHeatFlux(-1, 0.025), 'conductivity');
    expectCalcInputError(() => fourierHeatFlux(2.5, 20), 'gradient');
    expectCalcInputError(() => globalMeanFlux(1, 0), 'area');
  });
});
