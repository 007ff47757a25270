import { carbonUnitsCalculator } from './carbon-units.js';
import { energyBalanceCalculator } from './energy-balance.js';
import { ghgForcingCalculator } from './ghg-forcing.js';
import { heatFluxCompareCalculator } from './heat-flux-compare.js';
import { layerAtmosphereCalculator } from './layer-atmosphere.js';
import { oceanHeatCalculator } from './ocean-heat.js';
import { patternCompareCalculator } from './pattern-compare.js';
import { solarChangeCalculator } from './solar-change.js';
import { trendCalculator } from './trend.js';
import { warmingFromForcingCalculator } from './warming-from-forcing.js';
import { worksheetCalculator } from './worksheet.js';

/** Every calculator by id, in the order the desk lists them. */
export const calculatorDefinitions = {
  'energy-balance': energyBalanceCalculator,
  'layer-atmosphere': layerAtmosphereCalculator,
  'ghg-forcing': ghgForcingCalculator,
  'warming-from-forcing': warmingFromForcingCalculator,
  'heat-flux-compare': heatFluxCompareCalculator,
  'solar-change': solarChangeCalculator,
  'carbon-units': carbonUnitsCalculator,
  'ocean-heat': oceanHeatCalculator,
  trend: trendCalculator,
  'pattern-compare': patternCompareCalculator,
  worksheet: worksheetCalculator,
} as const;

/** The id of a calculator. */
export type CalculatorId = keyof typeof calculatorDefinitions;

/** The ids of all calculators, in list order. */
export const calculatorIds = Object.keys(calculatorDefinitions) as CalculatorId[];
