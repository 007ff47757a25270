import { type PhysicalConstant } from './physical-constant.js';

export const seawaterSpecificHeat: PhysicalConstant = {
  key: 'seawater_specific_heat',
  name: 'Specific heat of seawater used by TEOS-10 (c_p⁰)',
  value: 3991.86795711963,
  unit: 'J/(kg K)',
  uncertainty: { kind: 'exact' },
  source: 'IOC2010',
  note: 'TEOS-10 defines c_p⁰ exactly so that potential enthalpy / c_p⁰ is Conservative Temperature (IOC et al. 2010, section 3.3); the real c_p of seawater varies by a few per cent.',
};

export const seawaterDensity: PhysicalConstant = {
  key: 'seawater_density',
  name: 'Typical density of upper-ocean seawater',
  value: 1025,
  unit: 'kg/m^3',
  source: 'common-practice',
  note: 'A round value for surface seawater (1020–1030 kg/m³); deeper water is denser.',
};
