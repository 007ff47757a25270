import { ar6TcrePerPetagramCarbon } from './ar6-assessed-values.js';
import { type PhysicalConstant } from './physical-constant.js';

export const carbonAtomicWeight: PhysicalConstant = {
  key: 'atomic_weight_carbon',
  name: 'Standard atomic weight of carbon (conventional value)',
  value: 12.011,
  unit: 'g/mol',
  source: 'Prohaska2022',
  note: 'IUPAC conventional value for normal materials; the interval is [12.0096, 12.0116].',
};

export const oxygenAtomicWeight: PhysicalConstant = {
  key: 'atomic_weight_oxygen',
  name: 'Standard atomic weight of oxygen (conventional value)',
  value: 15.999,
  unit: 'g/mol',
  source: 'Prohaska2022',
  note: 'IUPAC conventional value for normal materials; the interval is [15.999 03, 15.999 77].',
};

export const co2MolarMass: PhysicalConstant = {
  key: 'molar_mass_co2',
  name: 'Molar mass of CO2',
  value: carbonAtomicWeight.value + 2 * oxygenAtomicWeight.value,
  unit: 'g/mol',
  source: 'Prohaska2022',
  derivedFrom: [carbonAtomicWeight.key, oxygenAtomicWeight.key],
  formula: 'M(CO2) = A(C) + 2 A(O)',
};

export const co2PerCarbonMassRatio: PhysicalConstant = {
  key: 'gtco2_per_gtc',
  name: 'Mass of CO2 that holds a unit mass of carbon',
  value: co2MolarMass.value / carbonAtomicWeight.value,
  unit: 'GtCO2/GtC',
  source: 'Prohaska2022',
  derivedFrom: [co2MolarMass.key, carbonAtomicWeight.key],
  formula: 'M(CO2) / A(C)',
  note: 'The Global Carbon Budget uses 3.664.',
};

export const carbonPerPpmCo2: PhysicalConstant = {
  key: 'gtc_per_ppm',
  name: 'Mass of carbon in 1 ppm of atmospheric CO2',
  value: 2.124,
  unit: 'GtC/ppm',
  source: 'Friedlingstein2022',
  note: 'Global Carbon Budget conversion (Friedlingstein et al. 2022, section 2.1), after Ballantyne et al. (2012).',
};

export const co2PerPpmCo2: PhysicalConstant = {
  key: 'gtco2_per_ppm',
  name: 'Mass of CO2 in 1 ppm of atmospheric CO2',
  value: carbonPerPpmCo2.value * co2PerCarbonMassRatio.value,
  unit: 'GtCO2/ppm',
  source: 'Friedlingstein2022',
  derivedFrom: [carbonPerPpmCo2.key, co2PerCarbonMassRatio.key],
  formula: '2.124 GtC/ppm × M(CO2)/A(C)',
};

export const airborneFraction: PhysicalConstant = {
  key: 'airborne_fraction',
  name: 'Airborne fraction of CO2 emissions (long-term mean)',
  value: 0.44,
  unit: '',
  source: 'Friedlingstein2022',
  note: 'From memory: the Global Carbon Budget finds that about 44 % of emissions since 1960 stayed in the air; it varies from year to year.',
};

export const ar6TcrePerThousandGtCo2: PhysicalConstant = {
  key: 'ar6_tcre',
  name: 'Transient climate response to cumulative CO2 emissions, per 1000 GtCO2 (AR6)',
  value: ar6TcrePerPetagramCarbon.value / co2PerCarbonMassRatio.value,
  unit: 'K per 1000 GtCO2',
  uncertainty: {
    kind: 'assessedRange',
    likely: [1.0 / co2PerCarbonMassRatio.value, 2.3 / co2PerCarbonMassRatio.value],
  },
  source: 'IPCC2021',
  derivedFrom: [ar6TcrePerPetagramCarbon.key, co2PerCarbonMassRatio.key],
  formula: 'TCRE per 1000 PgC ÷ (M(CO2)/A(C))',
  note: 'AR6 SPM D.1.1 rounds this to 0.45 °C (likely 0.27–0.63 °C) per 1000 GtCO2.',
};
