import { type PhysicalConstant } from './physical-constant.js';

// Global mean concentrations that AR6 uses for its 1750–2019 forcing (AR6 WG1 chapter 2,
// section 2.2.3; the same values feed Table 7.8). Uncertainties are from memory.

export const co2Concentration1750: PhysicalConstant = {
  key: 'co2_1750',
  name: 'CO2 concentration in 1750',
  value: 278.3,
  unit: 'ppm',
  uncertainty: { kind: 'plusMinus', value: 2.9, meaning: '5–95 % range' },
  source: 'Gulev2021',
};

export const co2Concentration2019: PhysicalConstant = {
  key: 'co2_2019',
  name: 'CO2 concentration in 2019',
  value: 409.9,
  unit: 'ppm',
  uncertainty: { kind: 'plusMinus', value: 0.4, meaning: '5–95 % range' },
  source: 'Gulev2021',
};

export const ch4Concentration1750: PhysicalConstant = {
  key: 'ch4_1750',
  name: 'CH4 concentration in 1750',
  value: 729.2,
  unit: 'ppb',
  uncertainty: { kind: 'plusMinus', value: 9.4, meaning: '5–95 % range' },
  source: 'Gulev2021',
};

export const ch4Concentration2019: PhysicalConstant = {
  key: 'ch4_2019',
  name: 'CH4 concentration in 2019',
  value: 1866.3,
  unit: 'ppb',
  uncertainty: { kind: 'plusMinus', value: 3.3, meaning: '5–95 % range' },
  source: 'Gulev2021',
};

export const n2oConcentration1750: PhysicalConstant = {
  key: 'n2o_1750',
  name: 'N2O concentration in 1750',
  value: 270.1,
  unit: 'ppb',
  uncertainty: { kind: 'plusMinus', value: 4.2, meaning: '5–95 % range' },
  source: 'Gulev2021',
};

export const n2oConcentration2019: PhysicalConstant = {
  key: 'n2o_2019',
  name: 'N2O concentration in 2019',
  value: 332.1,
  unit: 'ppb',
  uncertainty: { kind: 'plusMinus', value: 0.4, meaning: '5–95 % range' },
  source: 'Gulev2021',
};
