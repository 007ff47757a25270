import { geothermalHeatFlow } from '../constants/earth-constants.js';
import { earthSurfaceArea } from '../constants/earth-surface-area.js';
import { defineCalculator } from '../calculator/define-calculator.js';
import { shown, shownQuantity, step } from '../calculator/step.js';
import { type EvaluateContext, type InputSpec, type InputValues } from '../calculator/types.js';
import { CalcInputError } from '../errors/calc-input-error.js';
import { fourierHeatFlux } from '../heat/fourier-heat-flux.js';
import { globalMeanFlux } from '../heat/global-mean-flux.js';
import { referenceForcingDefault, referenceForcingHelp } from './shared-inputs.js';

const terawatt = 1e12;
const metresPerKilometre = 1000;

const inputs = [
  {
    kind: 'number',
    name: 'globalPower',
    label: 'Global heat flow',
    unit: 'TW',
    default: geothermalHeatFlow.value,
    min: 0,
    max: 1000000,
    source: 'Davies2010',
    help: 'A total heat flow spread over the whole Earth. Default: Earth’s geothermal flow, 47 ± 2 TW (Davies & Davies 2010). Leave it out when you give conductivity and gradient.',
  },
  {
    kind: 'number',
    name: 'conductivity',
    label: 'Thermal conductivity k',
    unit: 'W/(m K)',
    default: null,
    min: 0.01,
    max: 500,
    help: 'For Fourier’s law, with the gradient: conductivity of the rock. Continental crust is typically 2–3 W/(m K).',
  },
  {
    kind: 'number',
    name: 'gradient',
    label: 'Temperature gradient dT/dz',
    unit: 'K/km',
    default: null,
    min: 0,
    max: 1000,
    temperatureDifference: true,
    help: 'For Fourier’s law, with the conductivity: how fast temperature rises with depth. Typical crust: 20–30 K/km.',
  },
  {
    kind: 'number',
    name: 'referenceFlux',
    label: 'Reference flux',
    unit: 'W/m^2',
    default: referenceForcingDefault,
    min: 0.001,
    max: 1000,
    source: 'Forster2021',
    help: `The flux to compare with. Default: ${referenceForcingHelp} Earth’s energy imbalance 2006–2018 was about 0.79 W/m².`,
  },
] as const satisfies readonly InputSpec[];

type HeatFluxCompareOutputs = {
  flux: number;
  ratioToReference: number;
  globalPower: number;
};

type HeatValues = InputValues<typeof inputs>;

function usesFourierLaw(values: HeatValues, context: EvaluateContext): boolean {
  const hasConductivity = values.conductivity !== undefined;
  const hasGradient = values.gradient !== undefined;
  if (!hasConductivity && !hasGradient) return false;
  if (context.provided.has('globalPower')) {
    throw new CalcInputError(
      'globalPower',
      'give either globalPower or conductivity with gradient, not both',
      'heat-flux-compare',
    );
  }
  if (!hasConductivity) {
    throw new CalcInputError(
      'conductivity',
      'conductivity is required with gradient',
      'heat-flux-compare',
    );
  }
  if (!hasGradient) {
    throw new CalcInputError(
      'gradient',
      'gradient is required with conductivity',
      'heat-flux-compare',
    );
  }
  return true;
}

export const heatFluxCompareCalculator = defineCalculator<
  'heat-flux-compare',
  typeof inputs,
  HeatFluxCompareOutputs
>({
  id: 'heat-flux-compare',
  title: 'Heat flow compared with a forcing',
  summary:
    'A heat flow (a global power in TW, or Fourier’s law from conductivity and gradient) as a flux in W/m², set against a reference flux such as the human forcing.',
  inputs,
  outputs: {
    flux: { kind: 'number', label: 'Mean flux', unit: 'W/m^2' },
    ratioToReference: { kind: 'number', label: 'Flux ÷ reference flux', unit: '' },
    globalPower: { kind: 'number', label: 'Global power (the flux over all of Earth)', unit: 'TW' },
  },
  cautions: [
    'A steady heat flow such as the geothermal one has been there all along: it sets part of the background state, it does not add a new warming. Only a change of a flux forces the climate.',
    'Fourier’s law gives the local conductive flux; spreading it over the whole Earth assumes the same flux everywhere, which is not so (ocean floor and young crust lose more heat).',
  ],
  references: ['Davies2010', 'Pollack1993', 'Turcotte2014', 'Forster2021', 'Moritz2000'],
  evaluate: (values, context) => {
    const flux = usesFourierLaw(values, context)
      ? fourierHeatFlux(values.conductivity ?? 0, (values.gradient ?? 0) / metresPerKilometre)
      : globalMeanFlux(values.globalPower * terawatt, earthSurfaceArea.value);
    return {
      flux,
      ratioToReference: flux / values.referenceFlux,
      globalPower: (flux * earthSurfaceArea.value) / terawatt,
    };
  },
  explain: (values, outputs, context) => {
    const fourier = usesFourierLaw(values, context);
    return [
      fourier
        ? step(
            'Conductive flux (Fourier’s law)',
            `q = k dT/dz = ${shown(values.conductivity ?? 0)} W/(m K) × ${shown(values.gradient ?? 0)} K/km ÷ 1000 m/km`,
            shownQuantity(outputs.flux, 'W/m^2'),
          )
        : step(
            'Global power spread over Earth’s surface',
            `q = P / A = ${shown(values.globalPower)} × 10¹² W / ${shown(earthSurfaceArea.value)} m²`,
            shownQuantity(outputs.flux, 'W/m^2'),
          ),
      step(
        'Compared with the reference flux',
        `${shown(outputs.flux)} / ${shown(values.referenceFlux)}`,
        `${shown(outputs.ratioToReference, 3)} (${shown(outputs.ratioToReference * 100, 3)} %)`,
      ),
      step(
        'As a global power',
        `q × A = ${shown(outputs.flux)} W/m² × ${shown(earthSurfaceArea.value)} m²`,
        shownQuantity(outputs.globalPower, 'TW'),
      ),
    ];
  },
});
