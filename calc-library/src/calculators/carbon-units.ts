import { ar6CumulativeCo2Emissions } from '../constants/ar6-assessed-values.js';
import {
  airborneFraction,
  ar6TcrePerThousandGtCo2,
  carbonPerPpmCo2,
  co2PerCarbonMassRatio,
  co2PerPpmCo2,
} from '../constants/carbon-constants.js';
import { defineCalculator } from '../calculator/define-calculator.js';
import { shown, shownQuantity, step } from '../calculator/step.js';
import { type EvaluateContext, type InputSpec, type InputValues } from '../calculator/types.js';
import { concentrationRiseFromEmissions } from '../carbon/concentration-rise-from-emissions.js';
import { type CarbonAmountUnit, convertCarbonAmount } from '../carbon/convert-carbon-amount.js';
import { warmingFromCumulativeEmissions } from '../carbon/warming-from-cumulative-emissions.js';
import { CalcInputError } from '../errors/calc-input-error.js';

const inputs = [
  {
    kind: 'number',
    name: 'ppm',
    label: 'Amount as ppm of CO2',
    unit: 'ppm',
    default: 1,
    min: -100000,
    max: 100000,
    help: 'Give one of ppm, gtc or gtco2. The default 1 ppm is used when neither gtc nor gtco2 is given.',
  },
  {
    kind: 'number',
    name: 'gtc',
    label: 'Amount as GtC',
    unit: 'GtC',
    default: null,
    min: -1000000,
    max: 1000000,
    help: 'A mass of carbon in gigatonnes (= petagrams).',
  },
  {
    kind: 'number',
    name: 'gtco2',
    label: 'Amount as GtCO2',
    unit: 'GtCO2',
    default: null,
    min: -1000000,
    max: 1000000,
    help: 'A mass of CO2 in gigatonnes.',
  },
  {
    kind: 'number',
    name: 'cumulativeEmissions',
    label: 'Cumulative CO2 emissions',
    unit: 'GtCO2',
    default: ar6CumulativeCo2Emissions.value,
    min: -100000,
    max: 100000,
    source: 'IPCC2021',
    help: 'Total CO2 emitted. Default: 1850–2019, 2390 ± 240 GtCO2 (AR6 SPM D.1.1).',
  },
  {
    kind: 'number',
    name: 'airborneFraction',
    label: 'Airborne fraction',
    unit: '',
    default: airborneFraction.value,
    min: 0,
    max: 1,
    source: 'Friedlingstein2022',
    help: 'Share of emitted CO2 that stays in the air; the ocean and the land take up the rest. About 0.44 on average since 1960.',
  },
  {
    kind: 'number',
    name: 'tcre',
    label: 'TCRE',
    unit: 'K per 1000 GtCO2',
    default: ar6TcrePerThousandGtCo2.value,
    min: 0,
    max: 5,
    source: 'IPCC2021',
    help: 'Warming per 1000 GtCO2 emitted. AR6: best 0.45 K, likely 0.27–0.63 K (1.65 K per 1000 PgC).',
  },
] as const satisfies readonly InputSpec[];

type CarbonUnitsOutputs = {
  ppm: number;
  gtc: number;
  gtco2: number;
  concentrationRise: number;
  warming: number;
};

type CarbonValues = InputValues<typeof inputs>;

const amountInputs: readonly CarbonAmountUnit[] = ['ppm', 'gtc', 'gtco2'];

function givenAmount(
  values: CarbonValues,
  context: EvaluateContext,
): { amount: number; unit: CarbonAmountUnit } {
  const given: CarbonAmountUnit[] = [];
  for (const name of amountInputs) if (context.provided.has(name)) given.push(name);
  if (given.length > 1) {
    throw new CalcInputError(
      given[1] ?? 'gtc',
      `give only one of ppm, gtc and gtco2 (got ${given.join(' and ')})`,
      'carbon-units',
    );
  }
  if (values.gtc !== undefined) return { amount: values.gtc, unit: 'gtc' };
  if (values.gtco2 !== undefined) return { amount: values.gtco2, unit: 'gtco2' };
  return { amount: values.ppm, unit: 'ppm' };
}

export const carbonUnitsCalculator = defineCalculator<
  'carbon-units',
  typeof inputs,
  CarbonUnitsOutputs
>({
  id: 'carbon-units',
  title: 'Carbon units, emissions and warming',
  summary:
    'Converts an amount of CO2 between ppm, GtC and GtCO2; turns cumulative emissions into a rise of concentration (with an airborne fraction) and into warming (with the TCRE).',
  inputs,
  outputs: {
    ppm: { kind: 'number', label: 'As ppm of CO2', unit: 'ppm' },
    gtc: { kind: 'number', label: 'As GtC', unit: 'GtC' },
    gtco2: { kind: 'number', label: 'As GtCO2', unit: 'GtCO2' },
    concentrationRise: {
      kind: 'number',
      label: 'Concentration rise from the emissions',
      unit: 'ppm',
    },
    warming: { kind: 'number', label: 'Warming from the emissions (TCRE)', unit: 'K' },
  },
  cautions: [
    'ppm here means a change of the global mean concentration of CO2 in dry air; 2.124 GtC per ppm is the Global Carbon Budget factor.',
    'The airborne fraction changes from year to year and would change in future as the ocean and land sinks respond; a single fraction is a rough guide.',
    'The TCRE gives the warming from CO2 alone; other gases and aerosols add or take away warming.',
  ],
  references: ['Friedlingstein2022', 'Ballantyne2012', 'Prohaska2022', 'IPCC2021'],
  evaluate: (values, context) => {
    const { amount, unit } = givenAmount(values, context);
    const converted = convertCarbonAmount(amount, unit);
    // Properties listed one by one: an object spread here costs microseconds per Monte Carlo sample.
    return {
      ppm: converted.ppm,
      gtc: converted.gtc,
      gtco2: converted.gtco2,
      concentrationRise: concentrationRiseFromEmissions(
        values.cumulativeEmissions,
        values.airborneFraction,
      ),
      warming: warmingFromCumulativeEmissions(values.cumulativeEmissions, values.tcre),
    };
  },
  explain: (values, outputs, context) => {
    const { unit } = givenAmount(values, context);
    return [
      step(
        'Factors',
        `1 ppm = ${shown(carbonPerPpmCo2.value)} GtC; 1 GtC = M(CO2)/A(C) = ${shown(co2PerCarbonMassRatio.value)} GtCO2`,
        `1 ppm = ${shown(co2PerPpmCo2.value)} GtCO2`,
      ),
      step(
        `Amount given in ${unit === 'ppm' ? 'ppm' : unit === 'gtc' ? 'GtC' : 'GtCO2'}`,
        `${shown(outputs.ppm)} ppm = ${shown(outputs.gtc)} GtC = ${shown(outputs.gtco2)} GtCO2`,
        `${shownQuantity(outputs.gtc, 'GtC')}`,
      ),
      step(
        'Concentration rise from the emissions',
        `E × AF / ${shown(co2PerPpmCo2.value)} = ${shown(values.cumulativeEmissions)} × ${shown(values.airborneFraction)} / ${shown(co2PerPpmCo2.value)}`,
        shownQuantity(outputs.concentrationRise, 'ppm'),
      ),
      step(
        'Warming from the emissions',
        `TCRE × E / 1000 = ${shown(values.tcre)} × ${shown(values.cumulativeEmissions)} / 1000`,
        shownQuantity(outputs.warming, 'K'),
      ),
    ];
  },
});
