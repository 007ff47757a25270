import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { expectClose } from '../../test/expect-close.js';
import { runCalculator } from '../index.js';

describe('a result does not depend on the unit an input is given in', () => {
  it('takes solar irradiance in W/m² or kW/m²', () => {
    fc.assert(
      fc.property(fc.double({ min: 100, max: 3000, noNaN: true }), (irradiance) => {
        const inWatts = runCalculator('layer-atmosphere', {
          solarIrradiance: irradiance,
          layers: 2,
          layerEmissivity: 0.7,
        });
        const inKilowatts = runCalculator('layer-atmosphere', {
          solarIrradiance: { value: irradiance / 1000, unit: 'kW/m^2' },
          layers: 2,
          layerEmissivity: 0.7,
        });
        expectClose(
          inKilowatts.outputs.surfaceTemperature.value,
          inWatts.outputs.surfaceTemperature.value,
          { rel: 1e-12 },
        );
        expectClose(inKilowatts.inputs.solarIrradiance as number, irradiance, { rel: 1e-12 });
      }),
    );
  });

  it('takes a target surface temperature in K or °C', () => {
    fc.assert(
      fc.property(fc.double({ min: 256, max: 300, noNaN: true }), (kelvin) => {
        const inKelvin = runCalculator('layer-atmosphere', {
          solarIrradiance: 1361,
          albedo: 0.3,
          targetSurfaceTemperature: kelvin,
        });
        const inCelsius = runCalculator('layer-atmosphere', {
          solarIrradiance: 1361,
          albedo: 0.3,
          targetSurfaceTemperature: { value: kelvin - 273.15, unit: 'degC' },
        });
        expectClose(
          inCelsius.outputs.requiredEmissivity?.value ?? Number.NaN,
          inKelvin.outputs.requiredEmissivity?.value ?? Number.NaN,
          { rel: 1e-9 },
        );
      }),
    );
  });

  it('takes a climate sensitivity in K or °C (a difference: 3 °C is 3 K)', () => {
    fc.assert(
      fc.property(fc.double({ min: 1, max: 6, noNaN: true }), (sensitivity) => {
        const inKelvin = runCalculator('warming-from-forcing', { ecs: sensitivity });
        const inCelsius = runCalculator('warming-from-forcing', {
          ecs: { value: sensitivity, unit: 'degC' },
        });
        expectClose(
          inCelsius.outputs.equilibriumWarming.value,
          inKelvin.outputs.equilibriumWarming.value,
          { rel: 1e-12 },
        );
      }),
    );
  });

  it('takes concentrations in ppm, ppb or per cent, and emissions in GtCO2 or GtC', () => {
    const ppm = runCalculator('ghg-forcing', { co2: 420 });
    const ppb = runCalculator('ghg-forcing', { co2: { value: 420000, unit: 'ppb' } });
    expectClose(ppb.outputs.co2Forcing.value, ppm.outputs.co2Forcing.value, { rel: 1e-12 });
    const asCo2 = runCalculator('carbon-units', { cumulativeEmissions: 2390 });
    const asCarbon = runCalculator('carbon-units', {
      cumulativeEmissions: { value: 2390 / 3.6640579, unit: 'GtC' },
    });
    expectClose(asCarbon.outputs.warming.value, asCo2.outputs.warming.value, { rel: 1e-6 });
    expect(asCarbon.inputs.cumulativeEmissions).toBeCloseTo(2390, 3);
  });

  it('takes a period in years or months and an energy in ZJ or J', () => {
    const years = runCalculator('ocean-heat', { energy: 152, years: 12 });
    const months = runCalculator('ocean-heat', {
      energy: { value: 1.52e23, unit: 'J' },
      years: { value: 144, unit: 'month' },
    });
    expectClose(months.outputs.meanFlux.value, years.outputs.meanFlux.value, { rel: 1e-12 });
  });
});
