/// <reference types="node" />
// Benchmarks (not tests): prints the time of one run of each calculator, of a 10 000-sample
// Monte Carlo band, and of a trend on a 10 000-point series, each beside its target.
// Run with `npm run bench -w calc-library`.
import { performance } from 'node:perf_hooks';
import { calculatorIds, runCalculator, type CalculatorId } from '../src/index.js';

const bandTargetMs = 50;
const trendTargetMs = 5;
const bandSamples = 10000;

function syntheticSeries(count: number, start: number, step: number, seed: number) {
  // A deterministic warming line with a slowly varying wiggle, so runs are comparable.
  let state = seed;
  const noise = (): number => {
    state = (Math.imul(state, 1664525) + 1013904223) >>> 0;
    return state / 4294967296 - 0.5;
  };
  let persistent = 0;
  return Array.from({ length: count }, (_unused, index) => {
    persistent = 0.6 * persistent + 0.1 * noise();
    return { t: start + index * step, y: 0.018 * index * step + persistent };
  });
}

const series = syntheticSeries(46, 1979, 1, 7);
const secondSeries = syntheticSeries(46, 1979, 1, 11);

// Inputs of one ordinary run, and the inputs given as ranges for the band.
const cases: Record<
  CalculatorId,
  { run: Record<string, unknown>; band?: Record<string, unknown> }
> = {
  'energy-balance': { run: {}, band: { albedo: { low: 0.28, high: 0.31 } } },
  'layer-atmosphere': {
    run: { layers: 3, layerEmissivity: 0.8, targetSurfaceTemperature: 288 },
    band: {
      layers: 3,
      layerEmissivity: { low: 0.7, high: 0.9 },
      albedo: { low: 0.28, high: 0.31 },
    },
  },
  'ghg-forcing': {
    run: {},
    band: { co2: { low: 400, high: 420 }, ch4: { low: 1800, high: 1900 } },
  },
  'warming-from-forcing': {
    run: {},
    band: {
      ecs: { low: 2, high: 5, distribution: 'lognormal' },
      forcing: { low: 1.96, high: 3.48, distribution: 'normal' },
    },
  },
  'heat-flux-compare': { run: {}, band: { globalPower: { low: 45, high: 49 } } },
  'solar-change': { run: {}, band: { irradianceChange: { low: 0.5, high: 1.5 } } },
  'carbon-units': { run: { gtco2: 40 }, band: { airborneFraction: { low: 0.4, high: 0.5 } } },
  'ocean-heat': { run: {}, band: { energy: { low: 100, high: 205 } } },
  trend: { run: { series, seriesUnit: 'K' } },
  'pattern-compare': {
    run: {
      series: [
        { name: 'night', points: series },
        { name: 'day', points: secondSeries },
      ],
      seriesUnit: 'K',
    },
  },
  worksheet: { run: {} },
};

function medianTime(repeats: number, work: () => void): number {
  const times: number[] = [];
  for (let repeat = 0; repeat < repeats; repeat += 1) {
    const started = performance.now();
    work();
    times.push(performance.now() - started);
  }
  times.sort((first, second) => first - second);
  return times[Math.floor(times.length / 2)] ?? Number.NaN;
}

function cell(text: string, width: number): string {
  return text.padEnd(width);
}

const rows: string[][] = [];
let allWithinTargets = true;
for (const id of calculatorIds) {
  const { run, band } = cases[id];
  runCalculator(id, run); // warm up
  const runMs = medianTime(50, () => runCalculator(id, run));
  let bandText = 'n/a (no range inputs)';
  let verdict = '';
  if (band !== undefined) {
    runCalculator(id, band, { samples: bandSamples });
    const bandMs = medianTime(7, () => runCalculator(id, band, { samples: bandSamples }));
    const ok = bandMs <= bandTargetMs;
    allWithinTargets &&= ok;
    bandText = `${bandMs.toFixed(2)} ms`;
    verdict = ok ? 'ok' : 'OVER';
  }
  rows.push([
    id,
    `${runMs.toFixed(3)} ms`,
    bandText,
    band === undefined ? '' : `≤ ${bandTargetMs} ms`,
    verdict,
  ]);
}

const longSeries = syntheticSeries(10000, 1990, 1 / 365.25, 3);
runCalculator('trend', { series: longSeries, seriesUnit: 'K' });
const trendMs = medianTime(21, () =>
  runCalculator('trend', { series: longSeries, seriesUnit: 'K' }),
);
const trendOk = trendMs <= trendTargetMs;
allWithinTargets &&= trendOk;

const header = ['calculator', 'one run', `band (${bandSamples} samples)`, 'target', ''];
const widths = header.map((title, column) =>
  Math.max(title.length, ...rows.map((row) => (row[column] ?? '').length)),
);
const line = (row: string[]): string =>
  row
    .map((text, column) => cell(text, widths[column] ?? 0))
    .join('  ')
    .trimEnd();
const output = [
  `@skyledger/calc benchmarks on Node ${process.version} (median of repeated runs)`,
  '',
  line(header),
  line(widths.map((width) => '-'.repeat(width))),
  ...rows.map(line),
  '',
  `trend of a 10 000-point series (with start-year table): ${trendMs.toFixed(2)} ms   target ≤ ${trendTargetMs} ms   ${trendOk ? 'ok' : 'OVER'}`,
  '',
  allWithinTargets ? 'All figures within their targets.' : 'Some figures are over their targets.',
  '',
];
process.stdout.write(output.join('\n'));
