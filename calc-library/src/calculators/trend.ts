import { defineCalculator } from '../calculator/define-calculator.js';
import { shown, step } from '../calculator/step.js';
import { type InputSpec, type InputValues, type SeriesPoint } from '../calculator/types.js';
import { CalcInputError } from '../errors/calc-input-error.js';
import { type AdjustedTrend } from '../statistics/autocorrelation-adjusted-trend.js';
import {
  type SeriesArrays,
  indexRangeOfPeriod,
  trendOverPeriod,
} from '../statistics/trend-over-period.js';
import { fromInput, seriesUnitInput, toInput } from './shared-inputs.js';

const yearsPerDecade = 10;
// At most this many start years in the sensitivity table; starts are spread evenly.
const maximumStartRows = 50;
// A start year needs this many points before the end; fewer give trends that are all noise.
const minimumPointsPerStart = 5;

const inputs = [
  {
    kind: 'series',
    name: 'series',
    label: 'Time series',
    unit: '',
    default: null,
    minPoints: 3,
    maxPoints: 100000,
    help: 'Points { t, y } with t as a decimal year (e.g. 1979.042 for mid-January 1979), evenly spaced (monthly or yearly).',
  },
  fromInput,
  toInput,
  seriesUnitInput,
] as const satisfies readonly InputSpec[];

/** One row of `startYearSensitivity`: the trend from `start` to the end of the period. */
export type StartYearRow = {
  /** First year of the trend (decimal year). */
  start: number;
  /** Trend per decade. */
  slope: number;
  /** Lower end of its 95 % interval, per decade. */
  low: number;
  /** Upper end of its 95 % interval, per decade. */
  high: number;
  /** Points in the trend. */
  n: number;
};

type TrendOutputs = {
  slopePerDecade: number;
  ciLow: number;
  ciHigh: number;
  standardError: number;
  lag1Autocorrelation: number;
  effectiveSampleSize: number;
  n: number;
  startYearSensitivity: StartYearRow[];
};

type TrendValues = InputValues<typeof inputs>;

/** Splits points into parallel arrays (the points arrive sorted by time). */
export function seriesArrays(points: readonly SeriesPoint[]): SeriesArrays {
  const times = new Float64Array(points.length);
  const values = new Float64Array(points.length);
  points.forEach((point, index) => {
    times[index] = point.t;
    values[index] = point.y;
  });
  return { times, values };
}

/** True when the gaps between successive times differ by less than half of the smallest gap. */
export function isEvenlySpaced(points: readonly SeriesPoint[]): boolean {
  let smallest = Number.POSITIVE_INFINITY;
  let largest = 0;
  for (let index = 1; index < points.length; index += 1) {
    const gap = (points[index]?.t ?? 0) - (points[index - 1]?.t ?? 0);
    smallest = Math.min(smallest, gap);
    largest = Math.max(largest, gap);
  }
  return points.length < 3 || largest <= 1.5 * smallest;
}

/** Checks from/to against each other. */
export function checkPeriod(from: number | undefined, to: number | undefined, where: string): void {
  if (from !== undefined && to !== undefined && from >= to) {
    throw new CalcInputError('to', 'to must be later than from', where);
  }
}

/** Trend values per decade, for results. */
export function perDecade(trend: AdjustedTrend): {
  slope: number;
  low: number;
  high: number;
  standardError: number;
} {
  return {
    slope: trend.slope * yearsPerDecade,
    low: trend.low * yearsPerDecade,
    high: trend.high * yearsPerDecade,
    standardError: trend.standardError * yearsPerDecade,
  };
}

// The last central trend, so that explain() does not fit the same series twice.
let lastTrend:
  { series: readonly SeriesPoint[]; from?: number; to?: number; trend: AdjustedTrend } | undefined;

function centralTrend(values: TrendValues, series?: SeriesArrays): AdjustedTrend {
  if (
    lastTrend !== undefined &&
    lastTrend.series === values.series &&
    lastTrend.from === values.from &&
    lastTrend.to === values.to
  ) {
    return lastTrend.trend;
  }
  const trend = trendOverPeriod(
    series ?? seriesArrays(values.series),
    values.from,
    values.to,
    'series',
    'series',
  );
  lastTrend = { series: values.series, from: values.from, to: values.to, trend };
  return trend;
}

function startYearRows(series: SeriesArrays, values: TrendValues): StartYearRow[] {
  const { start, end } = indexRangeOfPeriod(series, values.from, values.to);
  const firstTime = series.times[start] ?? 0;
  const lastTime = series.times[end - 1] ?? 0;
  const firstYear = Math.ceil(firstTime);
  const lastStartTime = series.times[end - minimumPointsPerStart] ?? Number.NEGATIVE_INFINITY;
  const lastYear = Math.floor(Math.min(lastStartTime, lastTime));
  const candidates: number[] = [];
  if (lastYear >= firstYear) {
    const stride = Math.max(1, Math.ceil((lastYear - firstYear + 1) / maximumStartRows));
    for (let year = firstYear; year <= lastYear; year += stride) candidates.push(year);
  }
  const rows: StartYearRow[] = [];
  for (const year of candidates) {
    try {
      const trend = trendOverPeriod(series, year, values.to, 'series', 'series');
      const scaled = perDecade(trend);
      rows.push({
        start: year,
        slope: scaled.slope,
        low: scaled.low,
        high: scaled.high,
        n: trend.count,
      });
    } catch (error) {
      // A late start may leave too few independent values for an interval: skip that row.
      if (!(error instanceof CalcInputError)) throw error;
    }
  }
  return rows;
}

export const trendCalculator = defineCalculator<'trend', typeof inputs, TrendOutputs>({
  id: 'trend',
  title: 'Trend with an honest interval',
  summary:
    'Least-squares trend per decade of a time series, with a 95 % interval corrected for lag-1 autocorrelation (Santer et al. 2000, 2008), and how the trend changes with the start year.',
  inputs,
  outputs: {
    slopePerDecade: { kind: 'number', label: 'Trend per decade', unit: '(series unit)/decade' },
    ciLow: { kind: 'number', label: '95 % interval, low end', unit: '(series unit)/decade' },
    ciHigh: { kind: 'number', label: '95 % interval, high end', unit: '(series unit)/decade' },
    standardError: {
      kind: 'number',
      label: 'Standard error (autocorrelation adjusted)',
      unit: '(series unit)/decade',
    },
    lag1Autocorrelation: {
      kind: 'number',
      label: 'Lag-1 autocorrelation of residuals r₁',
      unit: '',
    },
    effectiveSampleSize: { kind: 'number', label: 'Effective sample size n_eff', unit: '' },
    n: { kind: 'number', label: 'Number of points n', unit: '' },
    startYearSensitivity: {
      kind: 'table',
      label: 'Trend by start year (to the same end)',
      unit: '',
      columns: [
        { key: 'start', label: 'Start year', unit: 'year' },
        { key: 'slope', label: 'Trend', unit: '(series unit)/decade' },
        { key: 'low', label: '95 % low', unit: '(series unit)/decade' },
        { key: 'high', label: '95 % high', unit: '(series unit)/decade' },
        { key: 'n', label: 'Points', unit: '' },
      ],
    },
  },
  cautions: [
    'A straight line through the data: it says how fast the series changed on average over the period, not why, and not what comes next.',
    'The interval allows for year-to-year persistence (an AR(1) process) but not for longer swings such as El Niño cycles; short periods give wide, fragile intervals.',
    'Picking the start year after looking at the data (e.g. starting at a record warm year) biases the trend: the start-year table shows how much it matters.',
    'When n_eff is 2 or less there is no interval and the calculator refuses: the period is too short or too autocorrelated to say anything. A negative r₁ is not allowed to make the interval narrower than the plain least-squares one.',
  ],
  references: ['Santer2000', 'Santer2008', 'NIST2012'],
  evaluate: (values) => {
    checkPeriod(values.from, values.to, 'trend');
    const series = seriesArrays(values.series);
    const trend = centralTrend(values, series);
    const scaled = perDecade(trend);
    return {
      slopePerDecade: scaled.slope,
      ciLow: scaled.low,
      ciHigh: scaled.high,
      standardError: scaled.standardError,
      lag1Autocorrelation: trend.lag1Autocorrelation,
      effectiveSampleSize: trend.effectiveSampleSize,
      n: trend.count,
      startYearSensitivity: startYearRows(series, values),
    };
  },
  explain: (values, outputs) => {
    const trend = centralTrend(values);
    const unit = values.seriesUnit === '' ? '1' : values.seriesUnit;
    const slopes = outputs.startYearSensitivity.map((row) => row.slope);
    const steps = [
      step(
        'Least-squares trend',
        `b = Σ(t − t̄)(y − ȳ) / Σ(t − t̄)² over n = ${trend.count} points, × 10 years`,
        `${shown(outputs.slopePerDecade)} ${unit}/decade`,
      ),
      step(
        'Lag-1 autocorrelation of the residuals',
        'r₁ = Σ eᵢ eᵢ₊₁ / Σ eᵢ²',
        shown(outputs.lag1Autocorrelation, 3),
      ),
      step(
        'Effective sample size',
        `n_eff = n (1 − r₁)/(1 + r₁) = ${trend.count} × (1 − ${shown(trend.lag1Autocorrelation, 3)}) / (1 + ${shown(trend.lag1Autocorrelation, 3)})${trend.lag1Autocorrelation < 0 ? ', capped at n' : ''}`,
        shown(outputs.effectiveSampleSize, 4),
      ),
      step(
        'Standard error, adjusted',
        `s_b √((n − 2)/(n_eff − 2)) = ${shown(trend.ordinaryStandardError * yearsPerDecade)} × √(${trend.count - 2} / ${shown(trend.degreesOfFreedom)})`,
        `${shown(outputs.standardError)} ${unit}/decade`,
      ),
      step(
        '95 % interval',
        `b ± t(0.975, n_eff − 2 = ${shown(trend.degreesOfFreedom)}) × s = ${shown(outputs.slopePerDecade)} ± ${shown(trend.criticalT)} × ${shown(outputs.standardError)}`,
        `${shown(outputs.ciLow)} to ${shown(outputs.ciHigh)} ${unit}/decade`,
      ),
    ];
    if (slopes.length > 1) {
      steps.push(
        step(
          'Sensitivity to the start year',
          `trend from each start year to the end, ${outputs.startYearSensitivity.length} starts`,
          `${shown(Math.min(...slopes))} to ${shown(Math.max(...slopes))} ${unit}/decade`,
        ),
      );
    }
    return steps;
  },
  unitPlaceholders: (values) => ({
    '(series unit)': values.seriesUnit === '' ? '1' : values.seriesUnit,
  }),
  extraCautions: (values, outputs) => {
    const cautions: string[] = [];
    if (outputs.effectiveSampleSize < 10) {
      cautions.push(
        `Only about ${shown(outputs.effectiveSampleSize, 2)} independent values: the interval rests on very little information.`,
      );
    }
    if (outputs.lag1Autocorrelation < 0) {
      cautions.push('The residuals have negative lag-1 autocorrelation; n_eff was capped at n.');
    }
    if (!isEvenlySpaced(values.series)) {
      cautions.push(
        'The points are not evenly spaced; the lag-1 autocorrelation assumes they are, so treat the interval with care.',
      );
    }
    return cautions;
  },
});
