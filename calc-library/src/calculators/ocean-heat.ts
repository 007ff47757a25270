import { oceanAreaFraction } from '../constants/earth-constants.js';
import { earthSurfaceArea } from '../constants/earth-surface-area.js';
import { seawaterDensity, seawaterSpecificHeat } from '../constants/ocean-constants.js';
import { secondsPerYear } from '../constants/time-constants.js';
import { defineCalculator } from '../calculator/define-calculator.js';
import { shown, shownQuantity, step } from '../calculator/step.js';
import { type InputSpec } from '../calculator/types.js';
import { meanFluxFromEnergy } from '../ocean/mean-flux-from-energy.js';
import { waterLayerWarming } from '../ocean/water-layer-warming.js';

const joulesPerZettajoule = 1e21;
const wattsPerTerawatt = 1e12;

const inputs = [
  {
    kind: 'number',
    name: 'energy',
    label: 'Energy',
    unit: 'ZJ',
    default: 152,
    min: -1000000,
    max: 1000000,
    source: 'Forster2021',
    help: 'Heat gained (1 ZJ = 10²¹ J). Default: Earth’s heat gain 2006–2018, about 152 ZJ (AR6 Table 7.1, from memory).',
  },
  {
    kind: 'number',
    name: 'years',
    label: 'Period',
    unit: 'year',
    default: 12,
    min: 0.001,
    max: 100000,
    help: 'Length of the period over which the energy was gained, in years (2006 to 2018 is 12 years).',
  },
  {
    kind: 'number',
    name: 'areaFraction',
    label: 'Share of Earth’s surface',
    unit: '',
    default: 1,
    min: 0.000001,
    max: 1,
    source: 'Eakins2010',
    help: `1 spreads the energy over the whole Earth (as for Earth’s energy imbalance); ${oceanAreaFraction.value} is the ocean’s share.`,
  },
  {
    kind: 'number',
    name: 'layerDepth',
    label: 'Depth of the water layer',
    unit: 'm',
    default: 2000,
    min: 1,
    max: 11000,
    help: 'Depth over which the heat is spread for the layer warming (Argo floats measure the top 2000 m).',
  },
] as const satisfies readonly InputSpec[];

type OceanHeatOutputs = {
  meanFlux: number;
  meanPower: number;
  layerWarming: number;
};

export const oceanHeatCalculator = defineCalculator<'ocean-heat', typeof inputs, OceanHeatOutputs>({
  id: 'ocean-heat',
  title: 'Ocean heat: energy, flux and warming',
  summary:
    'Turns an energy in zettajoules into the mean flux over a period and an area, and into the mean warming of a water layer.',
  inputs,
  outputs: {
    meanFlux: { kind: 'number', label: 'Mean flux over the area', unit: 'W/m^2' },
    meanPower: { kind: 'number', label: 'Mean power', unit: 'TW' },
    layerWarming: { kind: 'number', label: 'Mean warming of the water layer', unit: 'K' },
  },
  cautions: [
    'The layer warming spreads the heat evenly through the layer; the real ocean warms most near the surface.',
    'With the area share at 1 the layer covers the whole Earth; use 0.71 for the ocean.',
    'Seawater is taken at 1025 kg/m³ and the TEOS-10 specific heat 3992 J/(kg K); both vary by a few per cent.',
  ],
  references: ['Forster2021', 'IOC2010', 'Eakins2010', 'Moritz2000', 'Wilkins1989'],
  evaluate: (values) => {
    const energy = values.energy * joulesPerZettajoule;
    const duration = values.years * secondsPerYear.value;
    const area = earthSurfaceArea.value * values.areaFraction;
    return {
      meanFlux: meanFluxFromEnergy(energy, duration, area),
      meanPower: energy / duration / wattsPerTerawatt,
      layerWarming: waterLayerWarming({
        energy,
        depth: values.layerDepth,
        area,
        density: seawaterDensity.value,
        specificHeat: seawaterSpecificHeat.value,
      }),
    };
  },
  explain: (values, outputs) => {
    const area = earthSurfaceArea.value * values.areaFraction;
    return [
      step(
        'Area',
        `A = ${shown(values.areaFraction)} × ${shown(earthSurfaceArea.value)} m²`,
        shownQuantity(area, 'm^2'),
      ),
      step(
        'Mean flux',
        `E / (t A) = ${shown(values.energy)} × 10²¹ J / (${shown(values.years)} × ${shown(secondsPerYear.value)} s × ${shown(area)} m²)`,
        shownQuantity(outputs.meanFlux, 'W/m^2'),
      ),
      step(
        'Mean power',
        `E / t = ${shown(values.energy)} × 10²¹ J / (${shown(values.years)} × ${shown(secondsPerYear.value)} s)`,
        shownQuantity(outputs.meanPower, 'TW'),
      ),
      step(
        'Warming of the water layer',
        `E / (ρ c_p h A) = ${shown(values.energy)} × 10²¹ J / (${shown(seawaterDensity.value)} × ${shown(seawaterSpecificHeat.value)} × ${shown(values.layerDepth)} m × ${shown(area)} m²)`,
        shownQuantity(outputs.layerWarming, 'K'),
      ),
    ];
  },
});
