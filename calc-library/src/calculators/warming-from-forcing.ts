import {
  ar6Co2DoublingForcing,
  ar6EquilibriumClimateSensitivity,
  ar6PlanckFeedback,
  ar6TransientClimateResponse,
} from '../constants/ar6-assessed-values.js';
import { defineCalculator } from '../calculator/define-calculator.js';
import { shown, shownQuantity, step } from '../calculator/step.js';
import { type InputSpec } from '../calculator/types.js';
import { equilibriumWarming } from '../climate-response/equilibrium-warming.js';
import { planckResponse } from '../climate-response/planck-response.js';
import { transientWarming } from '../climate-response/transient-warming.js';
import { referenceForcingDefault, referenceForcingHelp } from './shared-inputs.js';

const inputs = [
  {
    kind: 'number',
    name: 'forcing',
    label: 'Forcing ΔF',
    unit: 'W/m^2',
    default: referenceForcingDefault,
    min: -50,
    max: 50,
    source: 'Forster2021',
    help: `A sustained radiative forcing. Default: ${referenceForcingHelp}`,
  },
  {
    kind: 'number',
    name: 'ecs',
    label: 'Equilibrium climate sensitivity',
    unit: 'K',
    default: ar6EquilibriumClimateSensitivity.value,
    min: 0.5,
    max: 10,
    temperatureDifference: true,
    source: 'Forster2021',
    help: 'Long-term warming for doubled CO2. AR6: best 3 K, likely 2.5–4 K, very likely 2–5 K.',
  },
  {
    kind: 'number',
    name: 'tcr',
    label: 'Transient climate response',
    unit: 'K',
    default: ar6TransientClimateResponse.value,
    min: 0.3,
    max: 6,
    temperatureDifference: true,
    source: 'Forster2021',
    help: 'Warming when CO2 has doubled at 1 % a year (about 70 years). AR6: best 1.8 K, likely 1.4–2.2 K.',
  },
  {
    kind: 'number',
    name: 'doublingForcing',
    label: 'Forcing of doubled CO2',
    unit: 'W/m^2',
    default: ar6Co2DoublingForcing.value,
    min: 1,
    max: 10,
    source: 'Forster2021',
    help: 'AR6: 3.93 ± 0.47 W/m² (effective radiative forcing).',
  },
  {
    kind: 'number',
    name: 'planckFeedback',
    label: 'Planck feedback λ_P',
    unit: 'W/m^2/K',
    default: ar6PlanckFeedback.value,
    min: -6,
    max: -1,
    source: 'Forster2021',
    help: 'Extra infrared a warmer planet sheds per kelvin, with no other feedback; negative because it restores balance. AR6: −3.22 W/m²/K.',
  },
] as const satisfies readonly InputSpec[];

type WarmingFromForcingOutputs = {
  equilibriumWarming: number;
  transientWarming: number;
  noFeedbackWarming: number;
  feedbackParameter: number;
};

export const warmingFromForcingCalculator = defineCalculator<
  'warming-from-forcing',
  typeof inputs,
  WarmingFromForcingOutputs
>({
  id: 'warming-from-forcing',
  title: 'Warming from a forcing',
  summary:
    'Equilibrium and transient warming for a sustained forcing, scaled from the climate sensitivity, and the warming there would be with no feedback but the Planck response.',
  inputs,
  outputs: {
    equilibriumWarming: { kind: 'number', label: 'Equilibrium warming', unit: 'K' },
    transientWarming: { kind: 'number', label: 'Transient warming', unit: 'K' },
    noFeedbackWarming: {
      kind: 'number',
      label: 'Warming with the Planck response only',
      unit: 'K',
    },
    feedbackParameter: {
      kind: 'number',
      label: 'Net feedback parameter λ = −F₂ₓ / ECS',
      unit: 'W/m^2/K',
    },
  },
  cautions: [
    'A linear forcing–response model: real feedbacks change with the pattern and the size of warming, and the equilibrium is reached only after centuries.',
    'Transient warming from the TCR only applies to a forcing that grew over decades at about the pace of 1 % CO2 a year.',
    'Give ECS and TCR as ranges (e.g. the AR6 likely ranges) to see the band the sensitivity uncertainty leaves.',
  ],
  references: ['Forster2021'],
  evaluate: (values) => ({
    equilibriumWarming: equilibriumWarming({
      forcing: values.forcing,
      sensitivity: values.ecs,
      doublingForcing: values.doublingForcing,
    }),
    transientWarming: transientWarming({
      forcing: values.forcing,
      sensitivity: values.tcr,
      doublingForcing: values.doublingForcing,
    }),
    noFeedbackWarming: planckResponse(values.forcing, values.planckFeedback),
    feedbackParameter: -values.doublingForcing / values.ecs,
  }),
  explain: (values, outputs) => [
    step(
      'Equilibrium warming',
      `ECS × ΔF / F₂ₓ = ${shown(values.ecs)} × ${shown(values.forcing)} / ${shown(values.doublingForcing)}`,
      shownQuantity(outputs.equilibriumWarming, 'K'),
    ),
    step(
      'Transient warming',
      `TCR × ΔF / F₂ₓ = ${shown(values.tcr)} × ${shown(values.forcing)} / ${shown(values.doublingForcing)}`,
      shownQuantity(outputs.transientWarming, 'K'),
    ),
    step(
      'No-feedback (Planck) warming',
      `−ΔF / λ_P = −${shown(values.forcing)} / (${shown(values.planckFeedback)})`,
      shownQuantity(outputs.noFeedbackWarming, 'K'),
    ),
    step(
      'Net feedback parameter',
      `−F₂ₓ / ECS = −${shown(values.doublingForcing)} / ${shown(values.ecs)}`,
      shownQuantity(outputs.feedbackParameter, 'W/m^2/K'),
    ),
  ],
  extraCautions: (values) =>
    values.tcr > values.ecs
      ? [
          'The TCR given is larger than the ECS; in the real climate the transient response is smaller than the equilibrium one.',
        ]
      : [],
});
