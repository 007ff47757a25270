import { calculators, libraryVersion } from '@skyledger/calc';
import type { WorkingView } from '@skyledger/contracts';
import { coreClaimId } from './claim-fixtures';
import { stationDatasetId } from './dataset-fixtures';
import { deskPeople } from './fixtures';

const editor = {
  id: deskPeople.science_editor.id,
  displayName: deskPeople.science_editor.displayName,
};

/** What `GET /api/calculators` answers: the library's own descriptions. */
export const calculatorCatalogue = { libraryVersion, calculators };

export const claimWorkingsPath = `/api/claims/${coreClaimId}/workings`;

// The layer working's outputs are what @skyledger/calc 0.1.0 answers for its inputs (the
// library's tests check them against the sources it cites); the trend working's figure is
// invented. Here they only test how the desk shows a working.
export const layerWorking: WorkingView = {
  id: '6f0b2d44-3c1e-4a9b-8d2f-7b0000000001',
  calculatorId: 'layer-atmosphere',
  libraryVersion: '0.1.0',
  inputs: {
    solarIrradiance: 1360.8,
    albedo: 0.29,
    layers: 1,
    layerEmissivity: { low: 0.7, high: 0.8, distribution: 'uniform' },
  },
  datasetRefs: null,
  outputs: {
    effectiveTemperature: { kind: 'number', value: 255.4731308422216, unit: 'K' },
    surfaceTemperature: {
      kind: 'number',
      value: 287.3261978966847,
      unit: 'K',
      band: { p5: 284.77157914565976, p50: 287.2829733351383, p95: 289.9570149701663 },
    },
    layerTemperatures: {
      kind: 'list',
      value: [241.6115698198015],
      unit: 'K',
      band: { p5: [239.46340006972477], p50: [241.57522244094628], p95: [243.8238144660805] },
    },
  },
  steps: [
    {
      text: 'Absorbed sunlight',
      formula: 'F = S (1 − α) / 4 = 1361 × 0.71 / 4',
      result: '241.5 W/m²',
    },
  ],
  cautions: [
    'Sunlight is assumed to pass the layers untouched and to be absorbed at the surface only.',
  ],
  monteCarlo: { samples: 10000, seed: 20190520, rangedInputs: ['layerEmissivity'] },
  note: 'One gray layer absorbing 70–80 % of the infrared holds the surface near 288 K.',
  ranBy: editor,
  ranAt: '2026-11-19T10:00:00.000Z',
  checkedAt: '2026-11-19T10:00:00.000Z',
  version: 3,
};

export const trendWorking: WorkingView = {
  id: '6f0b2d44-3c1e-4a9b-8d2f-7b0000000002',
  calculatorId: 'trend',
  libraryVersion: '0.1.0',
  inputs: {
    series: [
      { t: 2014, y: 0.31 },
      { t: 2015, y: 0.42 },
      { t: 2016, y: 0.87 },
      { t: 2017, y: 0.55 },
      { t: 2018, y: -0.12 },
    ],
    seriesUnit: 'K',
  },
  datasetRefs: { series: [{ dataset: stationDatasetId, column: 'anomaly_k' }] },
  outputs: {
    slopePerDecade: { kind: 'number', value: 0.1890909090909091, unit: 'K/decade' },
  },
  steps: [],
  cautions: [],
  monteCarlo: null,
  note: null,
  ranBy: editor,
  ranAt: '2026-11-20T09:30:00.000Z',
  checkedAt: '2026-11-20T09:30:00.000Z',
  version: 1,
};
