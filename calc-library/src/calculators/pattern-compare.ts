import { defineCalculator } from '../calculator/define-calculator.js';
import { shown, step } from '../calculator/step.js';
import { type InputSpec, type InputValues } from '../calculator/types.js';
import { type AdjustedTrend } from '../statistics/autocorrelation-adjusted-trend.js';
import { trendDifference } from '../statistics/trend-difference.js';
import { trendOverPeriod } from '../statistics/trend-over-period.js';
import { fromInput, seriesUnitInput, toInput } from './shared-inputs.js';
import { checkPeriod, perDecade, seriesArrays } from './trend.js';

const yearsPerDecade = 10;

const inputs = [
  {
    kind: 'seriesList',
    name: 'series',
    label: 'Series to compare',
    unit: '',
    default: null,
    minSeries: 2,
    maxSeries: 10,
    minPoints: 3,
    maxPoints: 100000,
    help: 'Two or more named series { name, points: [{ t, y }] } in the same unit, e.g. night and day temperatures, or upper and lower atmosphere.',
  },
  fromInput,
  toInput,
  seriesUnitInput,
] as const satisfies readonly InputSpec[];

/** One row of `seriesTrends`. */
export type SeriesTrendRow = {
  name: string;
  slopePerDecade: number;
  ciLow: number;
  ciHigh: number;
  standardError: number;
  lag1Autocorrelation: number;
  effectiveSampleSize: number;
  n: number;
};

/** One row of `pairDifferences`: `first` minus `second`. */
export type PairDifferenceRow = {
  first: string;
  second: string;
  /** Trend of first minus trend of second, per decade. */
  difference: number;
  ciLow: number;
  ciHigh: number;
  standardError: number;
  degreesOfFreedom: number;
  pValue: number;
  /** True when the difference is significant at the 5 % level (two-sided). */
  significant: boolean;
  /** The series whose trend is larger in size. */
  fasterSeries: string;
  /** Whether the two trends go the same way or opposite ways. */
  direction: 'same' | 'opposite';
};

type PatternCompareOutputs = {
  seriesTrends: SeriesTrendRow[];
  pairDifferences: PairDifferenceRow[];
  summary: string;
};

type PatternValues = InputValues<typeof inputs>;

interface NamedTrend {
  readonly name: string;
  readonly trend: AdjustedTrend;
}

function trendsOf(values: PatternValues): NamedTrend[] {
  checkPeriod(values.from, values.to, 'pattern-compare');
  return values.series.map((series) => ({
    name: series.name,
    trend: trendOverPeriod(
      seriesArrays(series.points),
      values.from,
      values.to,
      'series',
      `series "${series.name}"`,
      'pattern-compare',
    ),
  }));
}

function pairRow(first: NamedTrend, second: NamedTrend): PairDifferenceRow {
  const difference = trendDifference(
    {
      slope: first.trend.slope * yearsPerDecade,
      standardError: first.trend.standardError * yearsPerDecade,
      degreesOfFreedom: first.trend.degreesOfFreedom,
    },
    {
      slope: second.trend.slope * yearsPerDecade,
      standardError: second.trend.standardError * yearsPerDecade,
      degreesOfFreedom: second.trend.degreesOfFreedom,
    },
  );
  return {
    first: first.name,
    second: second.name,
    difference: difference.difference,
    ciLow: difference.low,
    ciHigh: difference.high,
    standardError: difference.standardError,
    degreesOfFreedom: difference.degreesOfFreedom,
    pValue: difference.pValue,
    significant: difference.significant,
    fasterSeries:
      Math.abs(first.trend.slope) >= Math.abs(second.trend.slope) ? first.name : second.name,
    direction:
      Math.sign(first.trend.slope) * Math.sign(second.trend.slope) < 0 ? 'opposite' : 'same',
  };
}

function pairSentence(row: PairDifferenceRow, unit: string): string {
  const slower = row.fasterSeries === row.first ? row.second : row.first;
  const verdict = row.significant
    ? 'the difference is statistically significant at the 5 % level'
    : 'the difference is not statistically significant at the 5 % level';
  const direction =
    row.direction === 'opposite' ? ' The two series change in opposite directions.' : '';
  return (
    `${row.fasterSeries} changes faster than ${slower}: ${row.first} minus ${row.second} is ` +
    `${shown(row.difference)} ${unit}/decade (95 % interval ${shown(row.ciLow)} to ${shown(row.ciHigh)}), and ` +
    `${verdict} (p = ${shown(row.pValue, 2)}).${direction}`
  );
}

export const patternCompareCalculator = defineCalculator<
  'pattern-compare',
  typeof inputs,
  PatternCompareOutputs
>({
  id: 'pattern-compare',
  title: 'Compare the trends of several series',
  summary:
    'Trends of two or more series side by side (night and day, winter and summer, high and low latitudes, upper and lower atmosphere), with each pair’s difference, its interval, and whether it is significant.',
  inputs,
  outputs: {
    seriesTrends: {
      kind: 'table',
      label: 'Trend of each series',
      unit: '',
      columns: [
        { key: 'name', label: 'Series', unit: '' },
        { key: 'slopePerDecade', label: 'Trend', unit: '(series unit)/decade' },
        { key: 'ciLow', label: '95 % low', unit: '(series unit)/decade' },
        { key: 'ciHigh', label: '95 % high', unit: '(series unit)/decade' },
        { key: 'standardError', label: 'Standard error', unit: '(series unit)/decade' },
        { key: 'lag1Autocorrelation', label: 'r₁', unit: '' },
        { key: 'effectiveSampleSize', label: 'n_eff', unit: '' },
        { key: 'n', label: 'n', unit: '' },
      ],
    },
    pairDifferences: {
      kind: 'table',
      label: 'Difference of each pair (first − second)',
      unit: '',
      columns: [
        { key: 'first', label: 'First', unit: '' },
        { key: 'second', label: 'Second', unit: '' },
        { key: 'difference', label: 'Difference', unit: '(series unit)/decade' },
        { key: 'ciLow', label: '95 % low', unit: '(series unit)/decade' },
        { key: 'ciHigh', label: '95 % high', unit: '(series unit)/decade' },
        { key: 'standardError', label: 'Standard error', unit: '(series unit)/decade' },
        { key: 'degreesOfFreedom', label: 'Degrees of freedom', unit: '' },
        { key: 'pValue', label: 'p value', unit: '' },
        { key: 'significant', label: 'Significant (5 %)', unit: '' },
        { key: 'fasterSeries', label: 'Changes faster', unit: '' },
        { key: 'direction', label: 'Direction', unit: '' },
      ],
    },
    summary: { kind: 'text', label: 'Which changes faster', unit: '' },
  },
  cautions: [
    'The series should be in the same unit and cover the same period; every trend uses only the points between from and to.',
    'The test treats the noise of the series as independent. Series that share noise (day and night at the same stations) have a smaller real uncertainty of their difference, so the test is then cautious; it does not correct for that.',
    'Testing many pairs makes a chance “significant” result more likely.',
  ],
  references: ['Santer2000', 'Santer2008', 'Satterthwaite1946'],
  evaluate: (values) => {
    const trends = trendsOf(values);
    const pairDifferences: PairDifferenceRow[] = [];
    trends.forEach((first, index) => {
      trends.slice(index + 1).forEach((second) => pairDifferences.push(pairRow(first, second)));
    });
    const unit = values.seriesUnit === '' ? '1' : values.seriesUnit;
    return {
      seriesTrends: trends.map(({ name, trend }) => {
        const scaled = perDecade(trend);
        return {
          name,
          slopePerDecade: scaled.slope,
          ciLow: scaled.low,
          ciHigh: scaled.high,
          standardError: scaled.standardError,
          lag1Autocorrelation: trend.lag1Autocorrelation,
          effectiveSampleSize: trend.effectiveSampleSize,
          n: trend.count,
        };
      }),
      pairDifferences,
      summary: pairDifferences.map((row) => pairSentence(row, unit)).join(' '),
    };
  },
  explain: (values, outputs) => {
    const unit = values.seriesUnit === '' ? '1' : values.seriesUnit;
    return [
      ...outputs.seriesTrends.map((row) =>
        step(
          `Trend of ${row.name}`,
          `least squares over n = ${row.n}, r₁ = ${shown(row.lag1Autocorrelation, 3)}, n_eff = ${shown(row.effectiveSampleSize)}`,
          `${shown(row.slopePerDecade)} ${unit}/decade (95 %: ${shown(row.ciLow)} to ${shown(row.ciHigh)})`,
        ),
      ),
      ...outputs.pairDifferences.map((row) =>
        step(
          `${row.first} − ${row.second}`,
          `d = (b₁ − b₂) / √(s₁² + s₂²) = ${shown(row.difference)} / ${shown(row.standardError)}, t test at ν = ${shown(row.degreesOfFreedom)} (Welch–Satterthwaite)`,
          `${shown(row.difference)} ${unit}/decade, p = ${shown(row.pValue, 2)}${row.significant ? ', significant' : ', not significant'}`,
        ),
      ),
    ];
  },
  unitPlaceholders: (values) => ({
    '(series unit)': values.seriesUnit === '' ? '1' : values.seriesUnit,
  }),
});
