import { describe, expect, it } from 'vitest';
import { expectCalcInputError } from '../../test/expect-calc-input-error.js';
import { expectClose } from '../../test/expect-close.js';
import { runCalculator } from '../index.js';

describe('layer-atmosphere', () => {
  it('gives the one-black-layer result and the emissivity for 288 K', () => {
    const result = runCalculator('layer-atmosphere', {
      solarIrradiance: 1361,
      albedo: 0.3,
      targetSurfaceTemperature: 288,
    });
    // Archer 2012, ch. 3: one black layer gives Tₛ = 2^(1/4) Tₑ
    expectClose(
      result.outputs.surfaceTemperature.value,
      2 ** 0.25 * result.outputs.effectiveTemperature.value,
      { rel: 1e-12 },
    );
    expectClose(
      result.outputs.greenhouseWarming.value,
      result.outputs.surfaceTemperature.value - result.outputs.effectiveTemperature.value,
      { rel: 1e-12 },
    );
    // common practice, no source: one gray layer of ε ≈ 0.78 gives 288 K
    expectClose(result.outputs.requiredEmissivity?.value ?? Number.NaN, 0.78, { abs: 0.005 });
    expect(result.outputs.layerTemperatures.value).toHaveLength(1);
  });

  it('warms by the closed-form amount for ε + 0.01 and steps down at ε = 1', () => {
    const result = runCalculator('layer-atmosphere', { layers: 1, layerEmissivity: 0.5 });
    const effective = result.outputs.effectiveTemperature.value;
    // Archer 2012, ch. 3: Tₛ = Tₑ (2/(2 − ε))^(1/4)
    expectClose(
      result.outputs.warmingPerEmissivityStep.value,
      effective * ((2 / 1.49) ** 0.25 - (2 / 1.5) ** 0.25),
      { rel: 1e-9 },
    );
    const black = runCalculator('layer-atmosphere', { layers: 1, layerEmissivity: 1 });
    const blackEffective = black.outputs.effectiveTemperature.value;
    expectClose(
      black.outputs.warmingPerEmissivityStep.value,
      blackEffective * (2 ** 0.25 - (2 / 1.01) ** 0.25),
      { rel: 1e-9 },
    );
    expect(black.steps.some((entry) => entry.formula.includes('cannot exceed 1'))).toBe(true);
  });
});

describe('ghg-forcing', () => {
  it('gives the AR6 ERF 1750–2019 with its defaults', () => {
    const result = runCalculator('ghg-forcing', {});
    // IPCC AR6 WG1 Table 7.8: CO2 2.16, CH4 0.54, N2O 0.21 W/m² (ERF 1750–2019)
    expectClose(result.outputs.co2Forcing.value, 2.16, { abs: 0.005 });
    expectClose(result.outputs.ch4Forcing.value, 0.54, { abs: 0.005 });
    expectClose(result.outputs.n2oForcing.value, 0.21, { abs: 0.005 });
    expectClose(
      result.outputs.totalForcing.value,
      result.outputs.co2Forcing.value +
        result.outputs.ch4Forcing.value +
        result.outputs.n2oForcing.value,
      { rel: 1e-12 },
    );
    expect(result.outputs.forcingKind.value).toMatch(/ERF/);
    expect(result.steps.some((entry) => entry.text.includes('SARF → ERF'))).toBe(true);
  });

  it('says when no adjustment is applied', () => {
    const result = runCalculator('ghg-forcing', {
      method: 'myhre1998',
      co2: 556,
      co2Reference: 278,
    });
    // Myhre et al. 1998: 2×CO2 gives 3.71 W/m²
    expectClose(result.outputs.co2Forcing.value, 3.71, { abs: 0.005 });
    expect(result.outputs.forcingKind.value).toMatch(/without AR6 adjustments/);
  });
});

describe('warming-from-forcing', () => {
  it('scales the AR6 sensitivities and reports the feedback parameter', () => {
    const result = runCalculator('warming-from-forcing', { forcing: 3.93 });
    // IPCC AR6 WG1 7.5: ECS 3 K and TCR 1.8 K are the warmings for the 2×CO2 forcing of 3.93 W/m²
    expectClose(result.outputs.equilibriumWarming.value, 3, { rel: 1e-12 });
    expectClose(result.outputs.transientWarming.value, 1.8, { rel: 1e-12 });
    expectClose(result.outputs.feedbackParameter.value, -1.31, { rel: 1e-12 });
  });

  it('warns when TCR exceeds ECS', () => {
    const result = runCalculator('warming-from-forcing', { ecs: 1.5, tcr: 2 });
    expect(result.cautions.some((caution) => caution.includes('TCR given is larger'))).toBe(true);
  });
});

describe('heat-flux-compare', () => {
  it('compares Earth’s geothermal flow with the human forcing', () => {
    const result = runCalculator('heat-flux-compare', {});
    // from memory: Davies & Davies 2010: 47 TW is about 0.09 W/m²; AR6 total anthropogenic ERF 2.72 W/m² (Forster et al. 2021)
    expectClose(result.outputs.flux.value, 0.092, { abs: 0.001 });
    expectClose(result.outputs.ratioToReference.value, result.outputs.flux.value / 2.72, {
      rel: 1e-12,
    });
    expectClose(result.outputs.globalPower.value, 47, { rel: 1e-12 });
  });

  it('uses Fourier’s law when conductivity and gradient are given', () => {
    const result = runCalculator('heat-flux-compare', { conductivity: 2.5, gradient: 25 });
    // common practice, no source: 2.5 W/(m K) × 25 K/km = 62.5 mW/m²
    expectClose(result.outputs.flux.value, 0.0625, { rel: 1e-12 });
    expect(result.steps[0]?.text).toMatch(/Fourier/);
  });

  it('refuses a mix of the two ways and a half-given Fourier law', () => {
    expectCalcInputError(
      () =>
        runCalculator('heat-flux-compare', { globalPower: 47, conductivity: 2.5, gradient: 25 }),
      'globalPower',
      /either/,
    );
    expectCalcInputError(
      () => runCalculator('heat-flux-compare', { conductivity: 2.5 }),
      'gradient',
      /required/,
    );
    expectCalcInputError(
      () => runCalculator('heat-flux-compare', { gradient: 25 }),
      'conductivity',
      /required/,
    );
  });
});

describe('solar-change', () => {
  it('gives the forcing of a solar-cycle swing and the two warming patterns', () => {
    const result = runCalculator('solar-change', { irradianceChange: 1, albedo: 0.3 });
    // common practice, no source: 1 W/m² more TSI is ΔS (1 − α)/4 ≈ 0.18 W/m² of forcing
    expectClose(result.outputs.irradianceForcing.value, 0.175, { rel: 1e-12 });
    expect(result.outputs.expectedPattern.value).toMatch(/stratosphere included/);
    expect(result.outputs.greenhousePattern.value).toMatch(/stratosphere cools/);
    expect(result.steps.some((entry) => entry.text === 'No AR6 adjustment applied')).toBe(true);
  });

  it('adds the cross term to the total change of absorbed sunlight', () => {
    const result = runCalculator('solar-change', {
      irradianceChange: 2,
      albedoChange: -0.01,
      solarIrradiance: 1360,
      albedo: 0.3,
    });
    const expected = (1362 * (1 - 0.29)) / 4 - (1360 * 0.7) / 4;
    expectClose(result.outputs.totalForcing.value, expected, { rel: 1e-12 });
    expectClose(result.outputs.albedoForcing.value, 3.4, { rel: 1e-12 });
    expect(result.outputs.expectedPattern.value).toMatch(/darker planet/i);
  });

  it('refuses an albedo change that leaves 0–1', () => {
    expectCalcInputError(
      () => runCalculator('solar-change', { albedo: 0.2, albedoChange: -0.3 }),
      'albedoChange',
      /between 0 and 1/,
    );
  });
});

describe('carbon-units', () => {
  it('converts one amount and applies the airborne fraction and TCRE', () => {
    const result = runCalculator('carbon-units', {
      gtc: 10,
      cumulativeEmissions: 1000,
      airborneFraction: 0.5,
    });
    // Friedlingstein et al. 2022: 2.124 GtC per ppm and 3.664 GtCO2 per GtC
    expectClose(result.outputs.ppm.value, 10 / 2.124, { rel: 1e-12 });
    expectClose(result.outputs.gtco2.value, 36.64, { rel: 1e-4 });
    expectClose(result.outputs.concentrationRise.value, 500 / (2.124 * 3.664), { rel: 1e-4 });
    // IPCC 2021 SPM D.1.1: 0.45 °C per 1000 GtCO2
    expectClose(result.outputs.warming.value, 0.45, { abs: 0.005 });
  });

  it('refuses two amounts at once', () => {
    expectCalcInputError(
      () => runCalculator('carbon-units', { ppm: 1, gtc: 2 }),
      'gtc',
      /only one/,
    );
    expectCalcInputError(
      () => runCalculator('carbon-units', { gtc: 1, gtco2: 2 }),
      'gtco2',
      /only one/,
    );
  });
});

describe('ocean-heat', () => {
  it('turns AR6’s heat gain into Earth’s energy imbalance', () => {
    const result = runCalculator('ocean-heat', {});
    // from memory: IPCC AR6 WG1 Table 7.1 / section 7.2.2: 152 ZJ in 2006–2018 is 0.79 W/m²
    expectClose(result.outputs.meanFlux.value, 0.79, { abs: 0.01 });
  });

  it('spreads the heat over the ocean share for the layer warming', () => {
    const ocean = runCalculator('ocean-heat', { energy: 10, areaFraction: 0.71, layerDepth: 700 });
    const expected = 1e22 / (1025 * 3991.86795711963 * 700 * 0.71 * 5.100658763934136e14);
    expectClose(ocean.outputs.layerWarming.value, expected, { rel: 1e-9 });
  });
});
