import { type SeedClaim } from '@skyledger/api/seeding';
import { datasetNames } from '../datasets/demo-datasets';
import { desk } from './desk';

type Workings = NonNullable<SeedClaim['workings']>;
const by = desk.editor;

/**
 * The science editor's workings on the demo claims, covering every calculator. Inputs are
 * left to the library's sourced defaults unless the check needs another value; series
 * come from the SYNTHETIC demo datasets.
 */
export const demoWorkings = {
  core: [
    {
      calculatorId: 'heat-flux-compare',
      inputs: { globalPower: { low: 44, high: 49, unit: 'TW' } },
      note: 'The whole geothermal heat flow, spread over the globe, against the AR6 forcing since 1750.',
      by,
    },
    {
      calculatorId: 'energy-balance',
      inputs: {},
      note: 'What sunlight alone holds the planet at: the budget the core’s heat has to be set against.',
      by,
    },
    {
      calculatorId: 'worksheet',
      inputs: {},
      note: 'The same sums line by line, for the copy desk.',
      by,
    },
  ],
  sun: [
    {
      calculatorId: 'solar-change',
      inputs: { irradianceChange: { low: -0.2, high: 0.2, unit: 'W/m^2' } },
      note: 'Even a generous change of the sun’s output since the 1980s next to greenhouse forcing.',
      by,
    },
    {
      calculatorId: 'pattern-compare',
      inputs: {
        series: [
          { dataset: datasetNames.layers, column: 'troposphere_k' },
          { dataset: datasetNames.layers, column: 'stratosphere_k' },
        ],
        seriesUnit: 'K',
      },
      note: 'A brighter sun would warm the stratosphere too; in the (synthetic) series it cools.',
      by,
    },
    {
      calculatorId: 'pattern-compare',
      inputs: {
        series: [
          { dataset: datasetNames.dayNight, column: 'night_min_k' },
          { dataset: datasetNames.dayNight, column: 'day_max_k' },
        ],
        seriesUnit: 'K',
      },
      note: 'Nights warming faster than days points to the greenhouse effect, not the sun (synthetic series).',
      by,
    },
  ],
  pause: [
    {
      calculatorId: 'trend',
      inputs: {
        series: { dataset: datasetNames.station, column: 'anomaly_k' },
        from: 2016,
        seriesUnit: 'K',
      },
      note: 'Started at the hot year of 2016, the trend is lost in the noise: the interval spans zero.',
      by,
    },
    {
      calculatorId: 'trend',
      inputs: { series: { dataset: datasetNames.station, column: 'anomaly_k' }, seriesUnit: 'K' },
      note: 'The whole record: a clear warming trend with a tight interval.',
      by,
    },
  ],
  co2: [
    {
      calculatorId: 'ghg-forcing',
      inputs: {},
      note: 'Forcing from the rise of CO2, methane and nitrous oxide since pre-industrial times (AR6).',
      by,
    },
    {
      calculatorId: 'layer-atmosphere',
      inputs: { targetSurfaceTemperature: 288 },
      note: 'How absorbing a single layer must be to hold the surface at 288 K: a trace gas can do it.',
      by,
    },
    {
      calculatorId: 'warming-from-forcing',
      inputs: { ecs: { low: 2.5, high: 4, unit: 'K', distribution: 'normal' } },
      note: 'The warming that forcing leads to, with the AR6 likely range of sensitivity.',
      by,
    },
    {
      calculatorId: 'carbon-units',
      inputs: { ppm: 140 },
      note: 'The 140 ppm rise since 1750 as tonnes of carbon and of CO2.',
      by,
    },
  ],
  oceans: [
    {
      calculatorId: 'ocean-heat',
      inputs: {},
      note: 'The heat the upper 2000 m gained in about a decade, as a flux through the sea surface.',
      by,
    },
  ],
} satisfies Record<string, Workings>;
