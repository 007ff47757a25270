import { defineCalculator } from '../calculator/define-calculator.js';
import { shown, shownQuantity, step } from '../calculator/step.js';
import { type InputSpec, type InputValues } from '../calculator/types.js';
import { CalcInputError } from '../errors/calc-input-error.js';
import { albedoChangeForcing } from '../solar/albedo-change-forcing.js';
import { solarIrradianceForcing } from '../solar/solar-irradiance-forcing.js';
import {
  expectedSunlightPattern,
  greenhouseWarmingPattern,
  type SunlightCause,
} from '../solar/warming-pattern-text.js';
import {
  albedoInput,
  referenceForcingDefault,
  referenceForcingHelp,
  solarIrradianceInput,
} from './shared-inputs.js';

const inputs = [
  {
    kind: 'number',
    name: 'irradianceChange',
    label: 'Change of solar irradiance ΔS',
    unit: 'W/m^2',
    default: 1,
    min: -100,
    max: 100,
    help: 'Change of total solar irradiance. The 11-year solar cycle swings it by roughly 1 W/m² (about 0.1 %).',
  },
  {
    kind: 'number',
    name: 'albedoChange',
    label: 'Change of albedo Δα',
    unit: '',
    default: 0,
    min: -0.5,
    max: 0.5,
    help: 'Change of the planet’s reflectivity (e.g. −0.01 for a darker planet).',
  },
  solarIrradianceInput,
  albedoInput,
  {
    kind: 'number',
    name: 'referenceForcing',
    label: 'Greenhouse forcing to compare with',
    unit: 'W/m^2',
    default: referenceForcingDefault,
    min: 0.001,
    max: 100,
    source: 'Forster2021',
    help: `Default: ${referenceForcingHelp}`,
  },
] as const satisfies readonly InputSpec[];

type SolarChangeOutputs = {
  irradianceForcing: number;
  albedoForcing: number;
  totalForcing: number;
  ratioToReference: number;
  expectedPattern: string;
  greenhousePattern: string;
};

type SolarValues = InputValues<typeof inputs>;

function exactChangeOfAbsorbedSunlight(values: SolarValues): number {
  return (
    ((values.solarIrradiance + values.irradianceChange) *
      (1 - values.albedo - values.albedoChange)) /
      4 -
    (values.solarIrradiance * (1 - values.albedo)) / 4
  );
}

function dominantCause(
  irradianceForcing: number,
  albedoForcing: number,
  values: SolarValues,
): SunlightCause {
  if (irradianceForcing === 0 && albedoForcing === 0) return 'no-change';
  if (Math.abs(irradianceForcing) >= Math.abs(albedoForcing)) {
    return values.irradianceChange > 0 ? 'brighter-sun' : 'dimmer-sun';
  }
  return values.albedoChange < 0 ? 'darker-planet' : 'brighter-planet';
}

export const solarChangeCalculator = defineCalculator<
  'solar-change',
  typeof inputs,
  SolarChangeOutputs
>({
  id: 'solar-change',
  title: 'Forcing from a change of sunlight or albedo',
  summary:
    'Forcing from a brighter or dimmer sun, or a darker or brighter planet, set against greenhouse forcing, with the pattern of warming each cause would leave.',
  inputs,
  outputs: {
    irradianceForcing: { kind: 'number', label: 'Forcing of the irradiance change', unit: 'W/m^2' },
    albedoForcing: { kind: 'number', label: 'Forcing of the albedo change', unit: 'W/m^2' },
    totalForcing: { kind: 'number', label: 'Change of absorbed sunlight', unit: 'W/m^2' },
    ratioToReference: { kind: 'number', label: 'Total ÷ greenhouse forcing', unit: '' },
    expectedPattern: {
      kind: 'text',
      label: 'Warming pattern this cause would leave',
      unit: '',
    },
    greenhousePattern: { kind: 'text', label: 'Warming pattern of greenhouse forcing', unit: '' },
  },
  cautions: [
    'Instantaneous forcing at the top of the atmosphere: no tropospheric adjustment is applied, so it is not an AR6 effective radiative forcing.',
    'Satellites have measured total solar irradiance since 1978; its changes over the 11-year cycle are about 0.1 %, and AR6 puts the solar forcing 1750–2019 near zero (0.01 W/m²).',
    'The pattern texts describe the fingerprints in general terms; set them against observations (e.g. a cooling stratosphere) rather than read them as a verdict.',
  ],
  references: ['Kopp2011', 'Forster2021', 'Gray2010', 'Stephens2015'],
  evaluate: (values) => {
    const albedoAfter = values.albedo + values.albedoChange;
    if (albedoAfter < 0 || albedoAfter > 1) {
      throw new CalcInputError(
        'albedoChange',
        'albedoChange must keep the albedo between 0 and 1',
        'solar-change',
      );
    }
    if (values.solarIrradiance + values.irradianceChange < 0) {
      throw new CalcInputError(
        'irradianceChange',
        'irradianceChange must not make the solar irradiance negative',
        'solar-change',
      );
    }
    const irradianceForcing = solarIrradianceForcing(values.irradianceChange, values.albedo);
    const albedoForcing = albedoChangeForcing(values.albedoChange, values.solarIrradiance);
    const totalForcing = exactChangeOfAbsorbedSunlight(values);
    return {
      irradianceForcing,
      albedoForcing,
      totalForcing,
      ratioToReference: totalForcing / values.referenceForcing,
      expectedPattern: expectedSunlightPattern(
        dominantCause(irradianceForcing, albedoForcing, values),
      ),
      greenhousePattern: greenhouseWarmingPattern(),
    };
  },
  explain: (values, outputs) => [
    step(
      'Forcing of the irradiance change',
      `ΔS (1 − α) / 4 = ${shown(values.irradianceChange)} × ${shown(1 - values.albedo)} / 4`,
      shownQuantity(outputs.irradianceForcing, 'W/m^2'),
    ),
    step(
      'Forcing of the albedo change',
      `−Δα S / 4 = −(${shown(values.albedoChange)}) × ${shown(values.solarIrradiance)} / 4`,
      shownQuantity(outputs.albedoForcing, 'W/m^2'),
    ),
    step(
      'Change of absorbed sunlight (both together)',
      `(S + ΔS)(1 − α − Δα)/4 − S (1 − α)/4, which adds the small cross term −ΔS Δα / 4 = ${shown((-values.irradianceChange * values.albedoChange) / 4)} W/m²`,
      shownQuantity(outputs.totalForcing, 'W/m^2'),
    ),
    step(
      'No AR6 adjustment applied',
      'this is the instantaneous change of absorbed sunlight, not an effective radiative forcing',
      '—',
    ),
    step(
      'Compared with the greenhouse forcing',
      `${shown(outputs.totalForcing)} / ${shown(values.referenceForcing)}`,
      `${shown(outputs.ratioToReference, 3)} (${shown(outputs.ratioToReference * 100, 3)} %)`,
    ),
  ],
});
