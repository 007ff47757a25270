import { stefanBoltzmannConstant } from '../constants/stefan-boltzmann-constant.js';
import { defineCalculator } from '../calculator/define-calculator.js';
import { shown, shownQuantity, step } from '../calculator/step.js';
import { type InputSpec } from '../calculator/types.js';
import { absorbedSolarFlux } from '../radiation/absorbed-solar-flux.js';
import { effectiveTemperature } from '../radiation/effective-temperature.js';
import { albedoInput, solarIrradianceInput } from './shared-inputs.js';

const inputs = [
  solarIrradianceInput,
  albedoInput,
  {
    kind: 'number',
    name: 'emissivity',
    label: 'Broadband emissivity ε',
    unit: '',
    default: 1,
    min: 0.01,
    max: 1,
    help: 'How well the planet radiates compared with a black body, 0.01–1. Use 1 for the effective (emission) temperature.',
  },
] as const satisfies readonly InputSpec[];

type EnergyBalanceOutputs = {
  absorbedFlux: number;
  effectiveTemperature: number;
};

export const energyBalanceCalculator = defineCalculator<
  'energy-balance',
  typeof inputs,
  EnergyBalanceOutputs
>({
  id: 'energy-balance',
  title: 'Planetary energy balance',
  summary:
    'Sunlight a planet absorbs, and the temperature at which it must radiate to shed it (its effective or emission temperature).',
  inputs,
  outputs: {
    absorbedFlux: { kind: 'number', label: 'Absorbed sunlight', unit: 'W/m^2' },
    effectiveTemperature: { kind: 'number', label: 'Effective temperature', unit: 'K' },
  },
  cautions: [
    'This is the temperature at which the planet radiates to space, not its surface temperature: Earth’s surface (about 288 K) is warmer because of the greenhouse effect, which this model leaves out.',
    'A planet-wide average in steady balance: days and nights, poles and tropics, and the years a planet takes to adjust are all averaged away.',
    'Albedo and emissivity are held fixed, although in reality they change as the planet warms (ice, clouds, water vapour).',
  ],
  references: ['Kopp2011', 'Stephens2015', 'Tiesinga2021', 'Pierrehumbert2010'],
  evaluate: (values) => ({
    absorbedFlux: absorbedSolarFlux(values.solarIrradiance, values.albedo),
    effectiveTemperature: effectiveTemperature(values),
  }),
  explain: (values, outputs) => [
    step(
      'Absorbed sunlight',
      `S (1 − α) / 4 = ${shown(values.solarIrradiance)} × ${shown(1 - values.albedo)} / 4`,
      shownQuantity(outputs.absorbedFlux, 'W/m^2'),
    ),
    step(
      'Effective temperature',
      `(F / (ε σ))^(1/4) = (${shown(outputs.absorbedFlux)} / (${shown(values.emissivity)} × ${shown(stefanBoltzmannConstant.value)}))^(1/4)`,
      shownQuantity(outputs.effectiveTemperature, 'K'),
    ),
  ],
});
