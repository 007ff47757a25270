import { type SeedDataset } from '@skyledger/api/seeding';
import { desk } from '../claims-desk/desk';
import { syntheticValues, toCsv, yearsFrom } from './synthetic-series';

const years = yearsFrom(1979, 2025);
const synthetic =
  'SYNTHETIC: invented by the demo seed (a line, autocorrelated noise and a few one-off years), not a measurement. ';

/** The names workings use to read them; seeded before the claims. */
export const datasetNames = {
  station: 'SYNTHETIC Marrowby station annual anomalies, 1979–2025',
  dayNight: 'SYNTHETIC day and night temperature anomalies, 1979–2025',
  layers: 'SYNTHETIC lower troposphere and lower stratosphere anomalies, 1979–2025',
} as const;

/**
 * Invented series for the demo's trend and comparison workings. The station series
 * warms about 0.2 K a decade, with a hot 2016: a start in 2016 makes it look flat.
 */
export const demoDatasets: SeedDataset[] = [
  {
    name: datasetNames.station,
    description: `${synthetic}Warms 0.019 K a year with a strong warm spike in 2016, so a trend started in 2016 looks flat.`,
    fileName: 'synthetic-marrowby-station-anomalies.csv',
    csv: toCsv(years, {
      anomaly_k: syntheticValues(
        {
          slopePerYear: 0.019,
          noise: 0.09,
          autocorrelation: 0.45,
          events: { 1982: -0.1, 1991: -0.15, 1998: 0.2, 2016: 0.3, 2017: 0.12 },
        },
        years,
        20_261_119,
      ),
    }),
    timeColumn: 'year',
    valueColumns: [{ column: 'anomaly_k', unit: 'K', label: 'Station anomaly' }],
    by: desk.editor,
  },
  {
    name: datasetNames.dayNight,
    description: `${synthetic}Nights warm faster than days, the pattern of a stronger greenhouse effect rather than a brighter sun.`,
    fileName: 'synthetic-day-night-anomalies.csv',
    csv: toCsv(years, {
      night_min_k: syntheticValues(
        { slopePerYear: 0.024, noise: 0.1, autocorrelation: 0.4 },
        years,
        20_261_120,
      ),
      day_max_k: syntheticValues(
        { slopePerYear: 0.014, noise: 0.12, autocorrelation: 0.4 },
        years,
        20_261_121,
      ),
    }),
    timeColumn: 'year',
    valueColumns: [
      { column: 'night_min_k', unit: 'K', label: 'Night (minimum)' },
      { column: 'day_max_k', unit: 'K', label: 'Day (maximum)' },
    ],
    by: desk.editor,
  },
  {
    name: datasetNames.layers,
    description: `${synthetic}The lower troposphere warms while the lower stratosphere cools, with warm volcanic spikes aloft in 1982 and 1991.`,
    fileName: 'synthetic-troposphere-stratosphere.csv',
    csv: toCsv(years, {
      troposphere_k: syntheticValues(
        {
          slopePerYear: 0.018,
          noise: 0.1,
          autocorrelation: 0.5,
          events: { 1998: 0.25, 2016: 0.2 },
        },
        years,
        20_261_122,
      ),
      stratosphere_k: syntheticValues(
        {
          slopePerYear: -0.025,
          noise: 0.12,
          autocorrelation: 0.5,
          events: { 1982: 0.5, 1983: 0.3, 1991: 0.6, 1992: 0.4 },
        },
        years,
        20_261_123,
      ),
    }),
    timeColumn: 'year',
    valueColumns: [
      { column: 'troposphere_k', unit: 'K', label: 'Lower troposphere' },
      { column: 'stratosphere_k', unit: 'K', label: 'Lower stratosphere' },
    ],
    by: desk.editor,
  },
];
