import { carbonAtomicWeight, co2MolarMass } from '../constants/carbon-constants.js';

/**
 * Units that mathjs does not know, grouped in families of interchangeable units. Each unit
 * maps to its size in the family's first unit. Units of different families never convert
 * into each other: a mass of carbon is not a mixing ratio.
 */
export interface UnitFamily {
  readonly name: string;
  readonly units: Readonly<Record<string, number>>;
}

// Mass of carbon per mass of CO2 that holds it: 12.011 / 44.009 (IUPAC atomic weights).
const carbonPerCo2 = carbonAtomicWeight.value / co2MolarMass.value;

export const unitFamilies: readonly UnitFamily[] = [
  {
    name: 'a dimensionless fraction or mixing ratio',
    units: {
      '': 1,
      '1': 1,
      '%': 0.01,
      ppm: 1e-6,
      ppb: 1e-9,
      ppt: 1e-12,
      'mol/mol': 1,
    },
  },
  {
    name: 'a mass of carbon (as C or as CO2)',
    units: {
      GtC: 1,
      PgC: 1,
      MtC: 1e-3,
      TgC: 1e-3,
      GtCO2: carbonPerCo2,
      PgCO2: carbonPerCo2,
      MtCO2: 1e-3 * carbonPerCo2,
      TgCO2: 1e-3 * carbonPerCo2,
    },
  },
  {
    name: 'warming per cumulative emission',
    units: {
      'K per 1000 GtCO2': 1,
      'K per 1000 PgCO2': 1,
      'K/(1000 GtCO2)': 1,
      'degC per 1000 GtCO2': 1,
      'K per 1000 GtC': carbonPerCo2,
      'K per 1000 PgC': carbonPerCo2,
      'K/(1000 PgC)': carbonPerCo2,
      'degC per 1000 PgC': carbonPerCo2,
    },
  },
  {
    name: 'a mass of carbon per ppm of CO2',
    units: { 'GtC/ppm': 1, 'PgC/ppm': 1, 'GtCO2/ppm': carbonPerCo2 },
  },
];

/** The family that holds `unit`, if any. */
export function findUnitFamily(unit: string): UnitFamily | undefined {
  return unitFamilies.find((family) => Object.hasOwn(family.units, unit));
}
