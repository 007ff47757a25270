import {
  ar6TroposphericAdjustmentCh4,
  ar6TroposphericAdjustmentCo2,
  ar6TroposphericAdjustmentN2o,
} from '../constants/ar6-assessed-values.js';
import {
  ch4Concentration1750,
  ch4Concentration2019,
  co2Concentration1750,
  co2Concentration2019,
  n2oConcentration1750,
  n2oConcentration2019,
} from '../constants/atmospheric-concentrations.js';
import { defineCalculator } from '../calculator/define-calculator.js';
import { shown, shownQuantity, step } from '../calculator/step.js';
import { type InputSpec, type InputValues, type Step } from '../calculator/types.js';
import { etminan2016Ch4Forcing } from '../forcing/etminan2016-ch4-forcing.js';
import { etminan2016Co2Forcing } from '../forcing/etminan2016-co2-forcing.js';
import { etminan2016N2oForcing } from '../forcing/etminan2016-n2o-forcing.js';
import { meinshausen2020Ch4Forcing } from '../forcing/meinshausen2020-ch4-forcing.js';
import { meinshausen2020Co2Forcing } from '../forcing/meinshausen2020-co2-forcing.js';
import { meinshausen2020N2oForcing } from '../forcing/meinshausen2020-n2o-forcing.js';
import { myhre1998Ch4Forcing } from '../forcing/myhre1998-ch4-forcing.js';
import { myhre1998Co2Forcing } from '../forcing/myhre1998-co2-forcing.js';
import { myhre1998N2oForcing } from '../forcing/myhre1998-n2o-forcing.js';

// Concentration ranges over which Etminan et al. (2016) fitted their expressions; the
// Meinshausen et al. (2020) refit used by AR6 was fitted to the same calculations, and the
// older Myhre et al. (1998) expressions are not better outside them.
const co2Range = { min: 180, max: 2000 } as const;
const ch4Range = { min: 340, max: 3500 } as const;
const n2oRange = { min: 200, max: 525 } as const;

const inputs = [
  {
    kind: 'number',
    name: 'co2',
    label: 'CO2 concentration',
    unit: 'ppm',
    default: co2Concentration2019.value,
    ...co2Range,
    source: 'Gulev2021',
    help: 'CO2 now or in the case to test, 180–2000 ppm. 2019: 409.9 ppm.',
  },
  {
    kind: 'number',
    name: 'co2Reference',
    label: 'Reference CO2',
    unit: 'ppm',
    default: co2Concentration1750.value,
    ...co2Range,
    source: 'Gulev2021',
    help: 'CO2 of the reference state. 1750: 278.3 ppm.',
  },
  {
    kind: 'number',
    name: 'ch4',
    label: 'CH4 concentration',
    unit: 'ppb',
    default: ch4Concentration2019.value,
    ...ch4Range,
    source: 'Gulev2021',
    help: 'Methane, 340–3500 ppb. 2019: 1866.3 ppb.',
  },
  {
    kind: 'number',
    name: 'ch4Reference',
    label: 'Reference CH4',
    unit: 'ppb',
    default: ch4Concentration1750.value,
    ...ch4Range,
    source: 'Gulev2021',
    help: 'Methane of the reference state. 1750: 729.2 ppb.',
  },
  {
    kind: 'number',
    name: 'n2o',
    label: 'N2O concentration',
    unit: 'ppb',
    default: n2oConcentration2019.value,
    ...n2oRange,
    source: 'Gulev2021',
    help: 'Nitrous oxide, 200–525 ppb. 2019: 332.1 ppb.',
  },
  {
    kind: 'number',
    name: 'n2oReference',
    label: 'Reference N2O',
    unit: 'ppb',
    default: n2oConcentration1750.value,
    ...n2oRange,
    source: 'Gulev2021',
    help: 'Nitrous oxide of the reference state. 1750: 270.1 ppb.',
  },
  {
    kind: 'choice',
    name: 'method',
    label: 'Expressions',
    unit: '',
    default: 'ar6',
    choices: [
      {
        value: 'ar6',
        label:
          'IPCC AR6: Meinshausen et al. (2020) with AR6 adjustments (effective radiative forcing)',
      },
      { value: 'etminan2016', label: 'Etminan et al. (2016) (stratospheric-adjusted forcing)' },
      {
        value: 'myhre1998',
        label: 'Myhre et al. (1998), IPCC TAR–AR5 (stratospheric-adjusted forcing)',
      },
    ],
    source: 'Forster2021',
    help: 'AR6 is the current assessment and gives effective radiative forcing (ERF); the others give the older stratospheric-adjusted forcing, for comparison with earlier reports.',
  },
] as const satisfies readonly InputSpec[];

type GhgForcingOutputs = {
  co2Forcing: number;
  ch4Forcing: number;
  n2oForcing: number;
  totalForcing: number;
  forcingKind: string;
};

type GhgValues = InputValues<typeof inputs>;

interface GasForcings {
  readonly co2: number;
  readonly ch4: number;
  readonly n2o: number;
}

function stratosphericAdjustedForcing(values: GhgValues): GasForcings {
  switch (values.method) {
    case 'ar6':
      return {
        co2: meinshausen2020Co2Forcing(values),
        ch4: meinshausen2020Ch4Forcing(values),
        n2o: meinshausen2020N2oForcing(values),
      };
    case 'etminan2016':
      return {
        co2: etminan2016Co2Forcing(values),
        ch4: etminan2016Ch4Forcing(values),
        n2o: etminan2016N2oForcing(values),
      };
    case 'myhre1998':
      return {
        co2: myhre1998Co2Forcing(values.co2, values.co2Reference),
        ch4: myhre1998Ch4Forcing(values),
        n2o: myhre1998N2oForcing(values),
      };
  }
}

const adjustmentFactors: GasForcings = {
  co2: ar6TroposphericAdjustmentCo2.value,
  ch4: ar6TroposphericAdjustmentCh4.value,
  n2o: ar6TroposphericAdjustmentN2o.value,
};

function formulaSteps(values: GhgValues, sarf: GasForcings): Step[] {
  const c = shown(values.co2);
  const c0 = shown(values.co2Reference);
  const m = shown(values.ch4);
  const m0 = shown(values.ch4Reference);
  const n = shown(values.n2o);
  const n0 = shown(values.n2oReference);
  switch (values.method) {
    case 'ar6':
      return [
        step(
          'CO2, Meinshausen et al. (2020)',
          `(α′ + c₁ √N) ln(C/C₀), α′ = d₁ + a₁ (C − C₀)² + b₁ (C − C₀); C = ${c}, C₀ = ${c0} ppm, N = ${n} ppb`,
          shownQuantity(sarf.co2, 'W/m^2'),
        ),
        step(
          'CH4, Meinshausen et al. (2020)',
          `(a₃ √M + b₃ √N + d₃)(√M − √M₀); M = ${m}, M₀ = ${m0}, N = ${n} ppb`,
          shownQuantity(sarf.ch4, 'W/m^2'),
        ),
        step(
          'N2O, Meinshausen et al. (2020)',
          `(a₂ √C + b₂ √N + c₂ √M + d₂)(√N − √N₀); N = ${n}, N₀ = ${n0} ppb`,
          shownQuantity(sarf.n2o, 'W/m^2'),
        ),
      ];
    case 'etminan2016':
      return [
        step(
          'CO2, Etminan et al. (2016)',
          `[a₁ (C − C₀)² + b₁ |C − C₀| + c₁ N̄ + 5.36] ln(C/C₀); C = ${c}, C₀ = ${c0} ppm`,
          shownQuantity(sarf.co2, 'W/m^2'),
        ),
        step(
          'CH4, Etminan et al. (2016)',
          `(a₃ M̄ + b₃ N̄ + 0.043)(√M − √M₀); M = ${m}, M₀ = ${m0} ppb`,
          shownQuantity(sarf.ch4, 'W/m^2'),
        ),
        step(
          'N2O, Etminan et al. (2016)',
          `(a₂ C̄ + b₂ N̄ + c₂ M̄ + 0.117)(√N − √N₀); N = ${n}, N₀ = ${n0} ppb`,
          shownQuantity(sarf.n2o, 'W/m^2'),
        ),
      ];
    case 'myhre1998':
      return [
        step(
          'CO2, Myhre et al. (1998)',
          `5.35 ln(C/C₀) = 5.35 ln(${c} / ${c0})`,
          shownQuantity(sarf.co2, 'W/m^2'),
        ),
        step(
          'CH4, Myhre et al. (1998)',
          `0.036 (√M − √M₀) − [f(M, N₀) − f(M₀, N₀)]; M = ${m}, M₀ = ${m0}, N₀ = ${n0} ppb`,
          shownQuantity(sarf.ch4, 'W/m^2'),
        ),
        step(
          'N2O, Myhre et al. (1998)',
          `0.12 (√N − √N₀) − [f(M₀, N) − f(M₀, N₀)]; N = ${n}, N₀ = ${n0}, M₀ = ${m0} ppb`,
          shownQuantity(sarf.n2o, 'W/m^2'),
        ),
      ];
  }
}

export const ghgForcingCalculator = defineCalculator<
  'ghg-forcing',
  typeof inputs,
  GhgForcingOutputs
>({
  id: 'ghg-forcing',
  title: 'Greenhouse-gas forcing',
  summary:
    'Radiative forcing from a change of CO2, methane and nitrous oxide, by the IPCC AR6 expressions (default), Etminan et al. (2016) or Myhre et al. (1998).',
  inputs,
  outputs: {
    co2Forcing: { kind: 'number', label: 'CO2 forcing', unit: 'W/m^2' },
    ch4Forcing: { kind: 'number', label: 'CH4 forcing', unit: 'W/m^2' },
    n2oForcing: { kind: 'number', label: 'N2O forcing', unit: 'W/m^2' },
    totalForcing: { kind: 'number', label: 'Total of the three gases', unit: 'W/m^2' },
    forcingKind: { kind: 'text', label: 'Kind of forcing', unit: '' },
  },
  cautions: [
    'Fitted expressions, valid for 180–2000 ppm CO2, 340–3500 ppb CH4 and 200–525 ppb N2O; outside these ranges they were not tested.',
    'Only CO2, CH4 and N2O: halocarbons, ozone, aerosols and land-use changes also force the climate (AR6 total anthropogenic ERF 1750–2019: 2.72 W/m²).',
    'Forcing is the push on the energy balance, not a warming: use warming-from-forcing to turn it into temperature.',
    'The AR6 method gives effective radiative forcing (with the AR6 tropospheric adjustments); the Etminan and Myhre methods give the older stratospheric-adjusted forcing. Compare like with like.',
  ],
  references: [
    'Meinshausen2020',
    'Smith2021',
    'Forster2021',
    'Etminan2016',
    'Myhre1998',
    'Ramaswamy2001',
    'Gulev2021',
  ],
  evaluate: (values) => {
    const sarf = stratosphericAdjustedForcing(values);
    const factors: GasForcings =
      values.method === 'ar6' ? adjustmentFactors : { co2: 1, ch4: 1, n2o: 1 };
    const co2Forcing = sarf.co2 * factors.co2;
    const ch4Forcing = sarf.ch4 * factors.ch4;
    const n2oForcing = sarf.n2o * factors.n2o;
    return {
      co2Forcing,
      ch4Forcing,
      n2oForcing,
      totalForcing: co2Forcing + ch4Forcing + n2oForcing,
      forcingKind:
        values.method === 'ar6'
          ? 'Effective radiative forcing (ERF), IPCC AR6'
          : 'Stratospheric-adjusted radiative forcing (SARF), without AR6 adjustments',
    };
  },
  explain: (values, outputs) => {
    const sarf = stratosphericAdjustedForcing(values);
    const steps = formulaSteps(values, sarf);
    if (values.method === 'ar6') {
      steps.push(
        step(
          'AR6 tropospheric adjustments (SARF → ERF)',
          `CO2 × ${shown(adjustmentFactors.co2)}, CH4 × ${shown(adjustmentFactors.ch4)}, N2O × ${shown(adjustmentFactors.n2o)}`,
          `${shownQuantity(outputs.co2Forcing, 'W/m^2')}, ${shownQuantity(outputs.ch4Forcing, 'W/m^2')}, ${shownQuantity(outputs.n2oForcing, 'W/m^2')}`,
        ),
      );
    } else {
      steps.push(
        step(
          'No tropospheric adjustment applied',
          'these expressions give stratospheric-adjusted forcing; AR6’s ERF would differ by the adjustment factors',
          '—',
        ),
      );
    }
    steps.push(
      step(
        'Total of the three gases',
        `${shown(outputs.co2Forcing)} + ${shown(outputs.ch4Forcing)} + ${shown(outputs.n2oForcing)}`,
        shownQuantity(outputs.totalForcing, 'W/m^2'),
      ),
    );
    return steps;
  },
});
