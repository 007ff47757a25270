import { defineCalculator } from '../calculator/define-calculator.js';
import { shown, shownQuantity, step } from '../calculator/step.js';
import { type InputSpec } from '../calculator/types.js';
import { absorbedSolarFlux } from '../radiation/absorbed-solar-flux.js';
import {
  grayLayerEquilibrium,
  surfaceEmissionPerAbsorbedFlux,
} from '../radiation/gray-layer-equilibrium.js';
import { radiatingTemperature } from '../radiation/radiating-temperature.js';
import { requiredLayerEmissivity } from '../radiation/required-layer-emissivity.js';
import { albedoInput, solarIrradianceInput } from './shared-inputs.js';

// The change of ε for which `warmingPerEmissivityStep` reports the surface warming.
const emissivityStep = 0.01;

const inputs = [
  solarIrradianceInput,
  albedoInput,
  {
    kind: 'number',
    name: 'layers',
    label: 'Number of layers N',
    unit: '',
    default: 1,
    min: 1,
    max: 10,
    integer: true,
    allowRange: false,
    help: 'Gray atmospheric layers stacked above the surface, 1–10.',
  },
  {
    kind: 'number',
    name: 'layerEmissivity',
    label: 'Layer emissivity ε',
    unit: '',
    default: 1,
    min: 0,
    max: 1,
    help: 'Share of infrared each layer absorbs (and its emissivity), 0–1. 1 is a black layer; about 0.78 in one layer gives Earth’s 288 K.',
  },
  {
    kind: 'number',
    name: 'targetSurfaceTemperature',
    label: 'Target surface temperature',
    unit: 'K',
    default: null,
    min: 1,
    max: 1000,
    help: 'Optional: an observed surface temperature (e.g. 288 K, or 15 °C); the calculator then finds the emissivity one layer needs to reach it.',
  },
] as const satisfies readonly InputSpec[];

type LayerAtmosphereOutputs = {
  effectiveTemperature: number;
  surfaceTemperature: number;
  layerTemperatures: number[];
  greenhouseWarming: number;
  warmingPerEmissivityStep: number;
  requiredEmissivity?: number;
};

function surfaceTemperatureFor(
  absorbedFlux: number,
  layers: number,
  layerEmissivity: number,
): number {
  return radiatingTemperature(
    absorbedFlux * surfaceEmissionPerAbsorbedFlux(layers, layerEmissivity),
  );
}

export const layerAtmosphereCalculator = defineCalculator<
  'layer-atmosphere',
  typeof inputs,
  LayerAtmosphereOutputs
>({
  id: 'layer-atmosphere',
  title: 'Layer model of the greenhouse effect',
  summary:
    'Surface and layer temperatures under N gray layers that let sunlight through and absorb infrared; the emissivity that matches an observed surface temperature; how much a little more absorption warms the surface.',
  inputs,
  outputs: {
    effectiveTemperature: { kind: 'number', label: 'Effective (emission) temperature', unit: 'K' },
    surfaceTemperature: { kind: 'number', label: 'Surface temperature', unit: 'K' },
    layerTemperatures: { kind: 'list', label: 'Layer temperatures, top layer first', unit: 'K' },
    greenhouseWarming: { kind: 'number', label: 'Greenhouse warming Tₛ − Tₑ', unit: 'K' },
    warmingPerEmissivityStep: {
      kind: 'number',
      label: 'Surface warming for ε + 0.01',
      unit: 'K',
      help: 'How much warmer the surface gets when each layer absorbs 0.01 more of the infrared.',
    },
    requiredEmissivity: {
      kind: 'number',
      label: 'Emissivity one layer needs for the target',
      unit: '',
      help: 'Only when a target surface temperature is given; for the one-layer model.',
    },
  },
  cautions: [
    'A teaching model: real air is not a few gray layers. Absorption depends strongly on wavelength, and convection, not radiation alone, sets the temperature of the lower atmosphere, so layer temperatures here are not those of the real atmosphere.',
    'Sunlight is assumed to pass the layers untouched and to be absorbed at the surface only.',
    'It shows why absorbing gases warm a surface, not by how much a given gas does: use the forcing and sensitivity calculators for that.',
  ],
  references: ['Archer2012', 'Pierrehumbert2010', 'Kopp2011', 'Stephens2015', 'Tiesinga2021'],
  evaluate: (values) => {
    const absorbed = absorbedSolarFlux(values.solarIrradiance, values.albedo);
    const effective = radiatingTemperature(absorbed);
    const equilibrium = grayLayerEquilibrium({
      absorbedFlux: absorbed,
      layers: values.layers,
      layerEmissivity: values.layerEmissivity,
    });
    const steppedUp = values.layerEmissivity + emissivityStep <= 1;
    const warmingPerEmissivityStep = steppedUp
      ? surfaceTemperatureFor(absorbed, values.layers, values.layerEmissivity + emissivityStep) -
        equilibrium.surfaceTemperature
      : equilibrium.surfaceTemperature -
        surfaceTemperatureFor(absorbed, values.layers, values.layerEmissivity - emissivityStep);
    const outputs: LayerAtmosphereOutputs = {
      effectiveTemperature: effective,
      surfaceTemperature: equilibrium.surfaceTemperature,
      layerTemperatures: equilibrium.layerTemperatures,
      greenhouseWarming: equilibrium.surfaceTemperature - effective,
      warmingPerEmissivityStep,
    };
    if (values.targetSurfaceTemperature !== undefined) {
      outputs.requiredEmissivity = requiredLayerEmissivity(
        effective,
        values.targetSurfaceTemperature,
      );
    }
    return outputs;
  },
  explain: (values, outputs) => {
    const absorbed = absorbedSolarFlux(values.solarIrradiance, values.albedo);
    const steps = [
      step(
        'Absorbed sunlight',
        `F = S (1 − α) / 4 = ${shown(values.solarIrradiance)} × ${shown(1 - values.albedo)} / 4`,
        shownQuantity(absorbed, 'W/m^2'),
      ),
      step(
        'Effective temperature (what space sees)',
        `Tₑ = (F / σ)^(1/4) = (${shown(absorbed)} / σ)^(1/4)`,
        shownQuantity(outputs.effectiveTemperature, 'K'),
      ),
      step(
        'Radiative balance of the surface and each layer',
        values.layers === 1
          ? `one layer of ε = ${shown(values.layerEmissivity)}: Tₛ = Tₑ (2 / (2 − ε))^(1/4), layer T = Tₛ / 2^(1/4)`
          : `${values.layers} layers of ε = ${shown(values.layerEmissivity)}: solve the ${values.layers + 1} balance equations (surface absorbs F plus the layers’ downward infrared; each layer absorbs ε of what reaches it and emits ε σT⁴ up and down) for σTₛ⁴ and each σTᵢ⁴`,
        `Tₛ = ${shownQuantity(outputs.surfaceTemperature, 'K')}; layers (top first) ${outputs.layerTemperatures
          .map((temperature) => shownQuantity(temperature, 'K'))
          .join(', ')}`,
      ),
      step(
        'Greenhouse warming',
        `Tₛ − Tₑ = ${shown(outputs.surfaceTemperature)} − ${shown(outputs.effectiveTemperature)}`,
        shownQuantity(outputs.greenhouseWarming, 'K'),
      ),
      step(
        'Warming for a little more absorption',
        values.layerEmissivity + emissivityStep <= 1
          ? `Tₛ(ε + 0.01) − Tₛ(ε) with ε = ${shown(values.layerEmissivity)}`
          : `Tₛ(ε) − Tₛ(ε − 0.01) with ε = ${shown(values.layerEmissivity)} (ε cannot exceed 1)`,
        shownQuantity(outputs.warmingPerEmissivityStep, 'K'),
      ),
    ];
    if (outputs.requiredEmissivity !== undefined && values.targetSurfaceTemperature !== undefined) {
      steps.push(
        step(
          'Emissivity one layer needs for the target',
          `ε = 2 (1 − (Tₑ / Tₛ)⁴) = 2 (1 − (${shown(outputs.effectiveTemperature)} / ${shown(values.targetSurfaceTemperature)})⁴)`,
          shown(outputs.requiredEmissivity, 3),
        ),
      );
    }
    return steps;
  },
});
