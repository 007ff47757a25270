import { type PhysicalConstant } from './physical-constant.js';

// The 2019 SI fixes these three constants exactly (CODATA 2018, Tiesinga et al. 2021,
// Table 1); everything the library derives from them is exact too, up to floating point.

export const planckConstant: PhysicalConstant = {
  key: 'planck_constant',
  name: 'Planck constant h',
  value: 6.62607015e-34,
  unit: 'J s',
  uncertainty: { kind: 'exact' },
  source: 'Tiesinga2021',
  note: 'Defining constant of the SI since 20 May 2019.',
};

export const boltzmannConstant: PhysicalConstant = {
  key: 'boltzmann_constant',
  name: 'Boltzmann constant k',
  value: 1.380649e-23,
  unit: 'J/K',
  uncertainty: { kind: 'exact' },
  source: 'Tiesinga2021',
  note: 'Defining constant of the SI since 20 May 2019.',
};

export const speedOfLight: PhysicalConstant = {
  key: 'speed_of_light',
  name: 'Speed of light in vacuum c',
  value: 299792458,
  unit: 'm/s',
  uncertainty: { kind: 'exact' },
  source: 'Tiesinga2021',
  note: 'Defining constant of the SI.',
};
