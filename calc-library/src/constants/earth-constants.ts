import { type PhysicalConstant } from './physical-constant.js';

export const solarIrradiance: PhysicalConstant = {
  key: 'solar_irradiance',
  name: 'Total solar irradiance at 1 au, solar minimum 2008',
  value: 1360.8,
  unit: 'W/m^2',
  uncertainty: { kind: 'plusMinus', value: 0.5, meaning: 'stated uncertainty' },
  source: 'Kopp2011',
  note: 'SORCE/TIM measurement, 1360.8 ± 0.5 W/m² (Kopp & Lean 2011, abstract).',
};

export const bondAlbedo: PhysicalConstant = {
  key: 'bond_albedo',
  name: "Earth's Bond (planetary) albedo, satellite era",
  value: 0.29,
  unit: '',
  source: 'Stephens2015',
  note: 'From memory: Stephens et al. (2015) put the satellite-era albedo at about 0.29. Textbooks often use 0.3.',
};

export const earthMeanRadius: PhysicalConstant = {
  key: 'earth_radius',
  name: "Earth's mean radius R1 = (2a + b)/3 of the GRS80 ellipsoid",
  value: 6371008.7714,
  unit: 'm',
  uncertainty: { kind: 'exact' },
  source: 'Moritz2000',
  note: 'Exact for the reference ellipsoid (Moritz 2000, derived geometric constants); the real Earth departs from it by tens of metres.',
};

export const oceanAreaFraction: PhysicalConstant = {
  key: 'ocean_area_fraction',
  name: "Share of Earth's surface covered by ocean",
  value: 0.71,
  unit: '',
  source: 'Eakins2010',
  note: 'From memory: ETOPO1 gives an ocean area of about 361 million km², 0.71 of the 510 million km² total.',
};

export const geothermalHeatFlow: PhysicalConstant = {
  key: 'geothermal_heat_flow',
  name: "Earth's total surface heat flow (geothermal)",
  value: 47,
  unit: 'TW',
  uncertainty: { kind: 'plusMinus', value: 2, meaning: 'stated uncertainty' },
  source: 'Davies2010',
  note: '47 ± 2 TW (preferred 46.7 TW) from a global heat-flow compilation, Davies & Davies (2010), abstract.',
};

export const geothermalHeatFlowPollack: PhysicalConstant = {
  key: 'geothermal_heat_flow_pollack1993',
  name: "Earth's total surface heat flow, earlier estimate",
  value: 44.2,
  unit: 'TW',
  uncertainty: { kind: 'plusMinus', value: 1, meaning: 'stated uncertainty' },
  source: 'Pollack1993',
  note: 'From memory: 44.2 ± 1.0 TW, global mean 87 mW/m² (Pollack et al. 1993, abstract).',
};
