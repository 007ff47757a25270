import { describe, expect, it } from 'vitest';
import { calculators, runCalculator } from '../index.js';
import { isReferenceKey } from '../references/bibliography.js';
import { convertQuantity } from '../units/convert-quantity.js';

describe('calculators describe themselves for forms', () => {
  it('declares every field the desk renders', () => {
    for (const calculator of calculators) {
      expect(calculator.title.length, calculator.id).toBeGreaterThan(3);
      expect(calculator.summary.length).toBeGreaterThan(20);
      expect(calculator.cautions.length).toBeGreaterThan(0);
      expect(calculator.references.length).toBeGreaterThan(0);
      expect(calculator.outputs.length).toBeGreaterThan(0);
      for (const input of calculator.inputs) {
        expect(input.name).toMatch(/^[a-z][A-Za-z0-9]*$/);
        expect(input.label.length).toBeGreaterThan(0);
        expect(input.help.length).toBeGreaterThan(0);
        if (input.source !== undefined) expect(isReferenceKey(input.source)).toBe(true);
        if (input.kind === 'number') {
          expect(input.min).toBeLessThan(input.max);
          if (input.default !== null) {
            expect(input.default, `${calculator.id}.${input.name}`).toBeGreaterThanOrEqual(
              input.min,
            );
            expect(input.default).toBeLessThanOrEqual(input.max);
          }
          // The declared unit must be one the converter knows.
          expect(
            convertQuantity(1, input.unit, {
              field: input.name,
              where: calculator.id,
              declaredUnit: input.unit,
            }),
          ).toBe(1);
        }
        if (input.kind === 'choice') {
          expect(input.choices.map((choice) => choice.value)).toContain(input.default);
        }
      }
    }
  });

  it('survives JSON, so the API can send it', () => {
    expect(JSON.parse(JSON.stringify(calculators))).toEqual(calculators);
  });

  it('runs every calculator that needs no series with its defaults and returns finite outputs', () => {
    for (const calculator of calculators) {
      if (calculator.inputs.some((input) => input.kind === 'series' || input.kind === 'seriesList'))
        continue;
      const result = runCalculator(calculator.id, {});
      expect(result.steps.length, calculator.id).toBeGreaterThan(0);
      for (const declared of calculator.outputs) {
        const output = (result.outputs as Record<string, { kind: string; value: unknown }>)[
          declared.name
        ];
        if (output === undefined) continue;
        expect(output.kind).toBe(declared.kind);
        if (output.kind === 'number') expect(Number.isFinite(output.value)).toBe(true);
        if (output.kind === 'list')
          expect((output.value as number[]).every(Number.isFinite)).toBe(true);
      }
    }
  });

  it('lists table columns that exist in the rows', () => {
    const series = Array.from({ length: 30 }, (_unused, index) => ({
      t: 1990 + index,
      y: 0.02 * index + 0.1 * Math.sin(index),
    }));
    const results = [
      runCalculator('trend', { series }),
      runCalculator('pattern-compare', {
        series: [
          { name: 'a', points: series },
          {
            name: 'b',
            points: series.map((point) => ({
              t: point.t,
              y: point.y * 0.5 + 0.05 * Math.cos(point.t),
            })),
          },
        ],
      }),
      runCalculator('worksheet', {}),
    ];
    for (const result of results) {
      for (const output of Object.values(result.outputs)) {
        if (output.kind !== 'table') continue;
        for (const row of output.value) {
          for (const column of output.columns) expect(Object.keys(row)).toContain(column.key);
        }
      }
    }
  });
});
