import { describe, expect, it } from 'vitest';
import { expectClose } from '../../test/expect-close.js';
import packageJson from '../../package.json' with { type: 'json' };
import {
  CalcInputError,
  calculators,
  constants,
  libraryVersion,
  references,
  runCalculator,
} from '../index.js';

describe('the public API of @skyledger/calc', () => {
  it('runs the example of issue 3', () => {
    const result = runCalculator('energy-balance', { solarIrradiance: 1361, albedo: 0.3 });
    // issue 3 example; common practice: S = 1361 W/m², α = 0.3 gives Tₑ = 254.58 K
    expectClose(result.outputs.effectiveTemperature.value, 254.58, { abs: 0.005 });
    expect(result.outputs.effectiveTemperature.unit).toBe('K');
    expect(result.calculatorId).toBe('energy-balance');
    expect(result.libraryVersion).toBe(libraryVersion);
    expect(result.inputs).toEqual({ solarIrradiance: 1361, albedo: 0.3, emissivity: 1 });
    expect(result.steps[0]).toEqual({
      text: 'Absorbed sunlight',
      formula: 'S (1 − α) / 4 = 1361 × 0.7 / 4',
      result: '238.2 W/m²',
    });
    expect(result.cautions.length).toBeGreaterThan(0);
  });

  it('exports the constants, references and the error class', () => {
    expect(constants.find((entry) => entry.key === 'stefan_boltzmann')?.source).toBe(
      'Tiesinga2021',
    );
    expect(references.find((reference) => reference.key === 'Myhre1998')?.doi).toBe(
      '10.1029/98GL01908',
    );
    expect(
      new CalcInputError('albedo', 'albedo must be between 0 and 1', 'energy-balance'),
    ).toBeInstanceOf(Error);
    expect(calculators.map((calculator) => calculator.id)).toEqual([
      'energy-balance',
      'layer-atmosphere',
      'ghg-forcing',
      'warming-from-forcing',
      'heat-flux-compare',
      'solar-change',
      'carbon-units',
      'ocean-heat',
      'trend',
      'pattern-compare',
      'worksheet',
    ]);
  });

  it('records the version of package.json', () => {
    expect(libraryVersion).toBe(packageJson.version);
  });

  it('gives results that survive JSON and can be run again from their inputs', () => {
    const first = runCalculator('ghg-forcing', {
      co2: { value: 0.042, unit: '%' },
      method: 'etminan2016',
    });
    const stored = JSON.parse(JSON.stringify(first)) as typeof first;
    const again = runCalculator('ghg-forcing', stored.inputs);
    expect(again.outputs).toEqual(first.outputs);
    expect(stored.inputs.co2).toBeCloseTo(420, 9);
  });
});
