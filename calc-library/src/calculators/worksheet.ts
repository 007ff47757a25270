import { defineCalculator } from '../calculator/define-calculator.js';
import { step } from '../calculator/step.js';
import { type InputSpec } from '../calculator/types.js';
import { evaluateWorksheet, type WorksheetLineResult } from '../worksheet/evaluate-worksheet.js';

const inputs = [
  {
    kind: 'lines',
    name: 'lines',
    label: 'Lines of arithmetic',
    unit: '',
    default: [
      'absorbed = solar_irradiance * (1 - bond_albedo) / 4',
      '(absorbed / stefan_boltzmann)^(1/4)',
      'geothermal_heat_flow / earth_surface_area to W/m^2',
    ],
    maxLines: 100,
    maxLineLength: 500,
    help: 'One expression per line with units (e.g. 47 TW / (5.1e14 m^2) to W/m^2). Named constants: stefan_boltzmann, earth_surface_area, solar_irradiance, seconds_per_year and the rest of the constants table. Assign with x = …; lines starting with # are notes.',
  },
] as const satisfies readonly InputSpec[];

type WorksheetOutputs = {
  results: WorksheetLineResult[];
};

export const worksheetCalculator = defineCalculator<'worksheet', typeof inputs, WorksheetOutputs>({
  id: 'worksheet',
  title: 'Worksheet',
  summary:
    'Free lines of arithmetic with units and named constants, for checks no calculator covers. A line with an error shows it and the others go on.',
  inputs,
  outputs: {
    results: {
      kind: 'table',
      label: 'Results, line by line',
      unit: '',
      columns: [
        { key: 'line', label: 'Line', unit: '' },
        { key: 'expression', label: 'Expression', unit: '' },
        { key: 'value', label: 'Value', unit: '' },
        { key: 'unit', label: 'Unit', unit: '' },
        { key: 'text', label: 'Result', unit: '' },
        { key: 'error', label: 'Error', unit: '' },
      ],
    },
  },
  cautions: [
    'The worksheet does the arithmetic it is given; whether the formula fits the question is for the desk to judge.',
    'Temperatures in °C or °F are absolute in mathjs: 3 degC to K is 276.15 K. Work in K for differences.',
  ],
  references: ['Tiesinga2021'],
  evaluate: (values) => ({ results: evaluateWorksheet(values.lines) }),
  explain: (_values, outputs) =>
    outputs.results.map((result) =>
      step(
        `Line ${result.line}`,
        result.expression,
        result.ok ? result.text : `error: ${result.error}`,
      ),
    ),
});
