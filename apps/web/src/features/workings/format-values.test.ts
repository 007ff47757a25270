import { calculators } from '@skyledger/calc';
import { describe, expect, it } from 'vitest';
import { inputText, outputText } from './format-values';

const spec = (calculatorId: string, name: string) =>
  calculators
    .find((calculator) => calculator.id === calculatorId)!
    .inputs.find((input) => input.name === name);

describe('inputText', () => {
  it('writes numbers in the declared unit and ranges with how they are drawn', () => {
    expect(inputText(spec('heat-flux-compare', 'globalPower'), 47)).toBe('47 TW');
    expect(
      inputText(spec('warming-from-forcing', 'ecs'), { low: 2, high: 5, distribution: 'normal' }),
    ).toBe('2 to 5 K (a normal range, 5th to 95th percentile)');
    expect(inputText(spec('layer-atmosphere', 'targetSurfaceTemperature'), undefined)).toBe(
      'not given',
    );
  });

  it('names a choice by its label and keeps lines apart', () => {
    const method = spec('ghg-forcing', 'method');
    expect(method?.kind).toBe('choice');
    const choice = method?.kind === 'choice' ? method.choices[0]! : undefined;
    expect(inputText(method, choice?.value)).toBe(choice?.label);
    expect(inputText(spec('worksheet', 'lines'), ['x = 3 m', 'x to cm'])).toBe('x = 3 m\nx to cm');
  });
});

describe('outputText', () => {
  it('writes each kind of output on one line', () => {
    expect(outputText({ kind: 'number', value: 2.16, unit: 'W/m^2' })).toBe('2.16 W/m²');
    expect(
      outputText({ kind: 'number', value: 3, unit: 'K', band: { p5: 2.1, p50: 3, p95: 4.6 } }),
    ).toBe('3 K; 2.1 to 4.6 K (5th to 95th percentile), median 3 K');
    expect(outputText({ kind: 'list', value: [241.61, 203.2], unit: 'K' })).toBe('241.6, 203.2 K');
    expect(outputText({ kind: 'text', value: 'ERF', unit: '' })).toBe('ERF');
    expect(outputText({ kind: 'table', value: [{}, {}], unit: '', columns: [] })).toBe(
      'a table of 2 rows',
    );
    expect(outputText(null)).toBe('not given');
  });
});
