import { bondAlbedo, solarIrradiance } from '../constants/earth-constants.js';
import { ar6TotalAnthropogenicForcing } from '../constants/ar6-assessed-values.js';

// Input declarations that several calculators share, so their defaults, ranges and
// sources stay the same everywhere.

export const solarIrradianceInput = {
  kind: 'number',
  name: 'solarIrradiance',
  label: 'Total solar irradiance S',
  unit: 'W/m^2',
  default: solarIrradiance.value,
  min: 0,
  max: 100000,
  source: 'Kopp2011',
  help: 'Sunlight arriving at the top of the atmosphere on a surface facing the Sun. Earth: 1360.8 W/m² (Kopp & Lean 2011); Mars about 586, Venus about 2601.',
} as const;

export const albedoInput = {
  kind: 'number',
  name: 'albedo',
  label: 'Bond albedo α',
  unit: '',
  default: bondAlbedo.value,
  min: 0,
  max: 1,
  source: 'Stephens2015',
  help: 'Share of sunlight reflected to space, 0–1. Earth: about 0.29 from satellites (textbooks often use 0.3).',
} as const;

export const referenceForcingHelp =
  'AR6 total anthropogenic effective radiative forcing 1750–2019, 2.72 W/m² (very likely 1.96–3.48).';

export const referenceForcingDefault = ar6TotalAnthropogenicForcing.value;

export const fromInput = {
  kind: 'number',
  name: 'from',
  label: 'From (decimal year)',
  unit: '',
  default: null,
  min: -100000,
  max: 100000,
  allowRange: false,
  help: 'First time to include, as a decimal year (e.g. 1979 or 1979.04). Leave empty to start at the first point.',
} as const;

export const toInput = {
  kind: 'number',
  name: 'to',
  label: 'To (decimal year)',
  unit: '',
  default: null,
  min: -100000,
  max: 100000,
  allowRange: false,
  help: 'Last time to include, as a decimal year. Leave empty to end at the last point.',
} as const;

export const seriesUnitInput = {
  kind: 'text',
  name: 'seriesUnit',
  label: 'Unit of the values',
  unit: '',
  default: '',
  maxLength: 40,
  help: 'Unit of the y values (e.g. K for temperature anomalies); it labels the trend, e.g. K/decade.',
} as const;
