import { calculators, type NumberInputSpec } from '@skyledger/calc';
import { describe, expect, it } from 'vitest';
import { convertBetween, unitChoices } from './unit-choices';

function numberInput(calculatorId: string, name: string): NumberInputSpec {
  const spec = calculators
    .find((calculator) => calculator.id === calculatorId)
    ?.inputs.find((input) => input.name === name);
  if (spec?.kind !== 'number') throw new Error(`no number input ${calculatorId}.${name}`);
  return spec;
}

describe('unit choices', () => {
  it('offers only units the library converts, the declared one first', () => {
    for (const calculator of calculators) {
      for (const spec of calculator.inputs) {
        if (spec.kind !== 'number') continue;
        const units = unitChoices(spec);
        expect(units[0]).toBe(spec.unit);
        // Each offered unit converts into the declared one (convertQuantity throws otherwise).
        for (const unit of units) {
          expect(Number.isFinite(convertBetween(1, unit, spec.unit, spec))).toBe(true);
        }
      }
    }
  });

  it('keeps a quantity’s meaning across units', () => {
    const irradiance = numberInput('energy-balance', 'solarIrradiance');
    expect(convertBetween(1360.8, 'W/m^2', 'kW/m^2', irradiance)).toBe(1.3608);
    expect(convertBetween(1.3608, 'kW/m^2', 'W/m^2', irradiance)).toBe(1360.8);
    // An absolute temperature has an offset: 15 °C is 288.15 K (SI Brochure, 9th ed., 2.3.1).
    const target = numberInput('layer-atmosphere', 'targetSurfaceTemperature');
    expect(convertBetween(15, 'degC', 'K', target)).toBe(288.15);
    expect(convertBetween(288.15, 'K', 'degC', target)).toBe(15);
    expect(convertBetween(59, 'degF', 'degC', target)).toBe(15);
    // A temperature difference has none: a sensitivity of 3 K is one of 3 °C.
    const ecs = numberInput('warming-from-forcing', 'ecs');
    expect(convertBetween(3, 'K', 'degC', ecs)).toBe(3);
    // Mixing ratios and shares: 1 ppm is 1000 ppb; an albedo of 0.29 is 29 %.
    expect(convertBetween(1866.3, 'ppb', 'ppm', numberInput('ghg-forcing', 'ch4'))).toBe(1.8663);
    expect(convertBetween(0.29, '', '%', numberInput('energy-balance', 'albedo'))).toBe(29);
    // 47 TW is 4.7 × 10¹³ W.
    expect(convertBetween(47, 'TW', 'W', numberInput('heat-flux-compare', 'globalPower'))).toBe(
      4.7e13,
    );
  });

  it('offers no percent for counts and years', () => {
    expect(unitChoices(numberInput('layer-atmosphere', 'layers'))).toEqual(['']);
    expect(unitChoices(numberInput('trend', 'from'))).toEqual(['']);
  });
});
