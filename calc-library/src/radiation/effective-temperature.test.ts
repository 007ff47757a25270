import { describe, it } from 'vitest';
import { expectCalcInputError } from '../../test/expect-calc-input-error.js';
import { expectClose } from '../../test/expect-close.js';
import { absorbedSolarFlux } from './absorbed-solar-flux.js';
import { effectiveTemperature } from './effective-temperature.js';
import { radiatingTemperature } from './radiating-temperature.js';

describe('effectiveTemperature', () => {
  it('gives the textbook Earth value', () => {
    // common practice, no source: S = 1361 W/m², α = 0.3 gives Tₑ ≈ 254.6 K (issue 3 quotes 254.58 K)
    expectClose(effectiveTemperature({ solarIrradiance: 1361, albedo: 0.3 }), 254.58, {
      abs: 0.005,
    });
  });

  it('reproduces the black-body temperatures of NASA’s planetary fact sheets', () => {
    // from memory: NASA Earth Fact Sheet (Williams): irradiance 1361.0 W/m², Bond albedo 0.306, black-body temperature 254.0 K
    expectClose(effectiveTemperature({ solarIrradiance: 1361, albedo: 0.306 }), 254.0, {
      abs: 0.05,
    });
    // from memory: NASA Venus Fact Sheet: irradiance 2601.3 W/m², Bond albedo 0.77, black-body temperature 226.6 K
    expectClose(effectiveTemperature({ solarIrradiance: 2601.3, albedo: 0.77 }), 226.6, {
      abs: 0.05,
    });
    // from memory: NASA Mars Fact Sheet: irradiance 586.2 W/m², Bond albedo 0.250, black-body temperature 209.8 K
    expectClose(effectiveTemperature({ solarIrradiance: 586.2, albedo: 0.25 }), 209.8, {
      abs: 0.05,
    });
  });

  it('scales with emissivity as ε^(−1/4)', () => {
    const black = effectiveTemperature({ solarIrradiance: 1361, albedo: 0.3 });
    const gray = effectiveTemperature({ solarIrradiance: 1361, albedo: 0.3, emissivity: 0.5 });
    expectClose(gray, black * 0.5 ** -0.25, { rel: 1e-12 });
  });

  it('refuses inputs out of range', () => {
    expectCalcInputError(() => absorbedSolarFlux(1361, 1.2), 'albedo', /between 0 and 1/);
    expectCalcInputError(() => absorbedSolarFlux(-1, 0.3), 'solarIrradiance');
    expectCalcInputError(
      () => effectiveTemperature({ solarIrradiance: 1361, albedo: 0.3, emissivity: 0 }),
      'emissivity',
    );
    expectCalcInputError(() => radiatingTemperature(Number.NaN), 'emittedFlux', /finite/);
  });
});
