import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { expectCalcInputError } from '../../test/expect-calc-input-error.js';
import { expectClose } from '../../test/expect-close.js';
import { runCalculator } from '../index.js';

const fastOptions = { samples: 1000 } as const;

describe('Monte Carlo bands', () => {
  it('contain their median and the point value sits at the centre of the ranges', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0.05, max: 0.9, noNaN: true }),
        fc.double({ min: 0.001, max: 0.05, noNaN: true }),
        (centre, halfWidth) => {
          const result = runCalculator(
            'energy-balance',
            { albedo: { low: centre - halfWidth, high: centre + halfWidth } },
            fastOptions,
          );
          const band = result.outputs.effectiveTemperature.band;
          expect(band).toBeDefined();
          if (band === undefined) return;
          expect(band.p5).toBeLessThanOrEqual(band.p50);
          expect(band.p50).toBeLessThanOrEqual(band.p95);
          expect(result.outputs.effectiveTemperature.value).toBeGreaterThanOrEqual(band.p5);
          expect(result.outputs.effectiveTemperature.value).toBeLessThanOrEqual(band.p95);
          expect(result.inputs.albedo).toEqual({
            low: centre - halfWidth,
            high: centre + halfWidth,
            distribution: 'uniform',
          });
        },
      ),
      { numRuns: 30 },
    );
  });

  it('narrow when the range narrows', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 340, max: 1500, noNaN: true }),
        fc.double({ min: 10, max: 150, noNaN: true }),
        fc.double({ min: 0.05, max: 0.95, noNaN: true }),
        (centre, halfWidth, shrink) => {
          const wide = runCalculator(
            'ghg-forcing',
            { co2: { low: centre - halfWidth, high: centre + halfWidth } },
            fastOptions,
          );
          const narrow = runCalculator(
            'ghg-forcing',
            { co2: { low: centre - shrink * halfWidth, high: centre + shrink * halfWidth } },
            fastOptions,
          );
          const wideBand = wide.outputs.co2Forcing.band;
          const narrowBand = narrow.outputs.co2Forcing.band;
          if (wideBand === undefined || narrowBand === undefined) throw new Error('no band');
          expect(narrowBand.p95 - narrowBand.p5).toBeLessThan(wideBand.p95 - wideBand.p5);
        },
      ),
      { numRuns: 30 },
    );
  });

  it('are the same for the same seed and change with the seed', () => {
    fc.assert(
      fc.property(fc.integer({ min: 0, max: 0xffffffff }), (seed) => {
        const inputs = {
          ecs: { low: 2, high: 5 },
          forcing: { low: 1.96, high: 3.48, distribution: 'normal' as const },
        };
        const first = runCalculator('warming-from-forcing', inputs, { samples: 500, seed });
        const second = runCalculator('warming-from-forcing', inputs, { samples: 500, seed });
        expect(second.outputs).toEqual(first.outputs);
        expect(first.monteCarlo).toEqual({ samples: 500, seed, rangedInputs: ['forcing', 'ecs'] });
        const other = runCalculator('warming-from-forcing', inputs, {
          samples: 500,
          seed: (seed + 1) % 2 ** 32,
        });
        expect(other.outputs.equilibriumWarming.band).not.toEqual(
          first.outputs.equilibriumWarming.band,
        );
      }),
      { numRuns: 10 },
    );
  });

  it('uses a fixed default seed and 10 000 samples', () => {
    const first = runCalculator('ocean-heat', { energy: { low: 100, high: 205 } });
    const second = runCalculator('ocean-heat', { energy: { low: 100, high: 205 } });
    expect(second.outputs.meanFlux.band).toEqual(first.outputs.meanFlux.band);
    expect(first.monteCarlo?.samples).toBe(10000);
  });

  it('gives the percentiles of a uniform range for a linear output', () => {
    const result = runCalculator('ocean-heat', { energy: { low: 100, high: 200 } });
    const band = result.outputs.meanPower.band;
    const perZettajoule = runCalculator('ocean-heat', { energy: 1 }).outputs.meanPower.value;
    if (band === undefined) throw new Error('no band');
    // A uniform draw on [100, 200] ZJ has 5th, 50th, 95th percentiles 105, 150, 195 ZJ; 10 000 samples put them within about 1 ZJ.
    expectClose(band.p5 / perZettajoule, 105, { abs: 1 });
    expectClose(band.p50 / perZettajoule, 150, { abs: 1.5 });
    expectClose(band.p95 / perZettajoule, 195, { abs: 1 });
  });

  it('reads normal and lognormal ranges as 5th–95th percentiles', () => {
    const normal = runCalculator('ocean-heat', {
      energy: { low: 100, high: 200, distribution: 'normal' },
    });
    const lognormal = runCalculator('warming-from-forcing', {
      ecs: { low: 2, high: 5, distribution: 'lognormal' },
    });
    const perZettajoule = runCalculator('ocean-heat', { energy: 1 }).outputs.meanPower.value;
    const normalBand = normal.outputs.meanPower.band;
    const lognormalBand = lognormal.outputs.equilibriumWarming.band;
    if (normalBand === undefined || lognormalBand === undefined) throw new Error('no band');
    expectClose(normalBand.p5 / perZettajoule, 100, { abs: 2 });
    expectClose(normalBand.p95 / perZettajoule, 200, { abs: 2 });
    // The lognormal median is the geometric mean √(2 × 5) of the range's ends.
    const atGeometricMean = runCalculator('warming-from-forcing', { ecs: Math.sqrt(10) });
    expectClose(
      lognormal.outputs.equilibriumWarming.value,
      atGeometricMean.outputs.equilibriumWarming.value,
      { rel: 1e-12 },
    );
    const scale = runCalculator('warming-from-forcing', { ecs: 1 }).outputs.equilibriumWarming
      .value;
    expectClose(lognormalBand.p5 / scale, 2, { abs: 0.05 });
    expectClose(lognormalBand.p95 / scale, 5, { abs: 0.12 });
  });

  it('bands list outputs element by element', () => {
    const result = runCalculator(
      'layer-atmosphere',
      { layers: 3, layerEmissivity: { low: 0.6, high: 0.9 } },
      fastOptions,
    );
    const band = result.outputs.layerTemperatures.band;
    expect(band?.p5).toHaveLength(3);
    band?.p5.forEach((low, index) =>
      expect(low).toBeLessThanOrEqual(band.p95[index] ?? Number.NaN),
    );
  });

  it('refuses a range whose samples leave a formula’s validity', () => {
    expectCalcInputError(
      () =>
        runCalculator(
          'layer-atmosphere',
          { albedo: { low: 0.1, high: 0.5 }, targetSurfaceTemperature: 290 },
          fastOptions,
        ),
      'targetSurfaceTemperature',
      /part of the given range/,
    );
  });
});
