import { describe, expect, it } from 'vitest';
import { expectCalcInputError } from '../../test/expect-calc-input-error.js';
import { type NumberInputSpec } from '../calculator/types.js';
import { type RunOptions } from '../calculator/types.js';
import { calculators, runCalculator } from '../index.js';

// The API passes inputs as parsed JSON, unchecked: call the untyped form, as it does.
function runLoosely(
  id: string,
  inputs?: Readonly<Record<string, unknown>>,
  options?: RunOptions,
): unknown {
  return runCalculator(id, inputs, options);
}

const series = Array.from({ length: 20 }, (_unused, index) => ({
  t: 2000 + index,
  y: 0.02 * index + 0.1 * Math.sin(index * 2.1),
}));

// Inputs each calculator needs so that only the input under test can be wrong.
const required: Readonly<Record<string, Record<string, unknown>>> = {
  trend: { series },
  'pattern-compare': {
    series: [
      { name: 'first', points: series },
      {
        name: 'second',
        points: series.map((point, index) => ({ t: point.t, y: point.y + 0.05 * Math.cos(index) })),
      },
    ],
  },
};

// A unit that measures something other than the declared one.
function incompatibleUnit(spec: NumberInputSpec): string {
  return spec.unit === 'kg' ? 'm' : 'kg';
}

const numberInputs = calculators.flatMap((calculator) =>
  calculator.inputs
    .filter((input): input is NumberInputSpec => input.kind === 'number')
    .map((input) => ({ id: calculator.id, input })),
);

describe('every number input of every calculator refuses bad values', () => {
  it.each(numberInputs)('$id: $input.name', ({ id, input }) => {
    const base = required[id] ?? {};
    const run = (value: unknown) => () => runLoosely(id, { ...base, [input.name]: value });
    const span = input.max - input.min;
    expectCalcInputError(run(input.min - Math.max(1e-6, span * 0.01)), input.name, /between/);
    expectCalcInputError(run(input.max + Math.max(1e-6, span * 0.01)), input.name, /between/);
    expectCalcInputError(run(Number.NaN), input.name, /finite/);
    expectCalcInputError(run('12'), input.name, /must be a number/);
    expectCalcInputError(
      run({ value: 1, unit: incompatibleUnit(input) }),
      input.name,
      /compatible unit/,
    );
    expectCalcInputError(
      run({ value: 1, unit: 'furlongs per fortnight' }),
      input.name,
      /compatible unit/,
    );
    if (input.allowRange === false) {
      expectCalcInputError(
        run({ low: input.min, high: input.max }),
        input.name,
        /cannot be a range/,
      );
    } else {
      expectCalcInputError(
        run({ low: input.max, high: input.min }),
        input.name,
        /low at most high/,
      );
      expectCalcInputError(run({ low: input.min, high: input.max + span }), input.name, /between/);
      expectCalcInputError(
        run({ low: input.min, high: input.max, distribution: 'cauchy' }),
        input.name,
        /distribution/,
      );
    }
    if (input.integer === true) {
      expectCalcInputError(run(input.min + 0.5), input.name, /whole number/);
    }
  });
});

describe('choice, text, series and lines inputs refuse bad values', () => {
  it('refuses an unknown choice', () => {
    expectCalcInputError(
      () => runLoosely('ghg-forcing', { method: 'ar7' }),
      'method',
      /one of ar6, etminan2016, myhre1998/,
    );
  });

  it('refuses a text that is not a string or too long', () => {
    expectCalcInputError(
      () => runLoosely('trend', { series, seriesUnit: 3 }),
      'seriesUnit',
      /string/,
    );
    expectCalcInputError(
      () => runLoosely('trend', { series, seriesUnit: 'K'.repeat(41) }),
      'seriesUnit',
      /at most 40/,
    );
  });

  it('refuses missing, empty, too short and malformed series', () => {
    expectCalcInputError(() => runLoosely('trend', {}), 'series', /required/);
    expectCalcInputError(() => runLoosely('trend', { series: [] }), 'series', /must not be empty/);
    expectCalcInputError(
      () => runLoosely('trend', { series: series.slice(0, 2) }),
      'series',
      /at least 3 points/,
    );
    expectCalcInputError(() => runLoosely('trend', { series: 'not a series' }), 'series', /array/);
    expectCalcInputError(
      () => runLoosely('trend', { series: [...series, { t: 2050, y: Number.NaN }] }),
      'series',
      /finite/,
    );
    expectCalcInputError(
      () => runLoosely('trend', { series: [...series, { t: 2050 }] }),
      'series',
      /finite/,
    );
    expectCalcInputError(() => runLoosely('trend', { series: [...series, 7] }), 'series', /point/);
    expectCalcInputError(
      () => runLoosely('trend', { series: [...series, { t: 2000, y: 1 }] }),
      'series',
      /distinct/,
    );
  });

  it('refuses a period that holds too few points or runs backwards', () => {
    expectCalcInputError(
      () => runLoosely('trend', { series, from: 2017.5 }),
      'series',
      /at least 3 points between from and to/,
    );
    expectCalcInputError(
      () => runLoosely('trend', { series, from: 2010, to: 2005 }),
      'to',
      /later than from/,
    );
    expectCalcInputError(
      () => runLoosely('pattern-compare', { ...required['pattern-compare'], from: 2018.5 }),
      'series',
      /"first" needs at least 3 points/,
    );
  });

  it('refuses a series too autocorrelated for an interval (n_eff ≤ 2)', () => {
    // One and a half slow waves and no noise: r₁ ≈ 0.91, n_eff ≈ 1.
    const curved = Array.from({ length: 20 }, (_unused, index) => ({
      t: 2000 + index,
      y: Math.sin((3 * Math.PI * (index + 1)) / 21),
    }));
    expectCalcInputError(() => runLoosely('trend', { series: curved }), 'series', /n_eff/);
  });

  it('refuses bad series lists', () => {
    const list = required['pattern-compare']?.series as { name: string; points: unknown[] }[];
    expectCalcInputError(
      () => runLoosely('pattern-compare', { series: list.slice(0, 1) }),
      'series',
      /at least 2 series/,
    );
    expectCalcInputError(
      () => runLoosely('pattern-compare', { series: [] }),
      'series',
      /at least 2 series/,
    );
    expectCalcInputError(
      () => runLoosely('pattern-compare', { series: [list[0], { ...list[1], name: 'first' }] }),
      'series',
      /distinct/,
    );
    expectCalcInputError(
      () => runLoosely('pattern-compare', { series: [list[0], { ...list[1], name: ' ' }] }),
      'series',
      /name/,
    );
    expectCalcInputError(
      () =>
        runLoosely('pattern-compare', {
          series: [list[0], { name: 'short', points: series.slice(0, 2) }],
        }),
      'series',
      /"short" needs at least 3 points/,
    );
    expectCalcInputError(
      () => runLoosely('pattern-compare', { series: [list[0], { name: 'empty', points: [] }] }),
      'series',
      /"empty" must not be empty/,
    );
    expectCalcInputError(
      () => runLoosely('pattern-compare', { series: [list[0], 'x'] }),
      'series',
      /series/,
    );
  });

  it('refuses empty, too long and malformed worksheets', () => {
    expectCalcInputError(
      () => runLoosely('worksheet', { lines: [] }),
      'lines',
      /at least one line/,
    );
    expectCalcInputError(
      () => runLoosely('worksheet', { lines: ['', '  '] }),
      'lines',
      /at least one line/,
    );
    expectCalcInputError(
      () => runLoosely('worksheet', { lines: ['1'.repeat(501)] }),
      'lines',
      /at most 500 characters/,
    );
    expectCalcInputError(
      () => runLoosely('worksheet', { lines: Array.from({ length: 101 }, () => '1') }),
      'lines',
      /at most 100 lines/,
    );
    expectCalcInputError(() => runLoosely('worksheet', { lines: [1, 2] }), 'lines', /strings/);
  });
});

describe('calls and options', () => {
  it('refuses an unknown calculator and unknown input names', () => {
    expectCalcInputError(() => runLoosely('energy-balanse', {}), 'calculatorId', /one of/);
    expectCalcInputError(
      () => runLoosely('energy-balance', { albedoo: 0.3 }),
      'albedoo',
      /not an input/,
    );
    expectCalcInputError(
      () => runLoosely('energy-balance', [1] as unknown as Record<string, unknown>),
      'inputs',
    );
  });

  it('refuses Monte Carlo options out of range', () => {
    expectCalcInputError(() => runLoosely('energy-balance', {}, { samples: 10 }), 'samples');
    expectCalcInputError(() => runLoosely('energy-balance', {}, { samples: 1.5e6 }), 'samples');
    expectCalcInputError(() => runLoosely('energy-balance', {}, { seed: -3 }), 'seed');
  });

  it('refuses a quantity given as both a value and a range', () => {
    expectCalcInputError(
      () => runLoosely('energy-balance', { albedo: { value: 0.3, low: 0.2, high: 0.4 } }),
      'albedo',
      /not both/,
    );
  });

  it('never returns NaN: every error is a CalcInputError with a field and a rule', () => {
    expect(() => runLoosely('energy-balance', { albedo: Number.POSITIVE_INFINITY })).toThrow(
      /finite/,
    );
  });
});
