import { calculators, type InputSpec } from '@skyledger/calc';
import { describe, expect, it } from 'vitest';
import { buildInputs, type ResolveDataset } from './build-inputs';
import { initialFormState, type FieldState, type FormState } from './form-state';

const inputsOf = (id: string): readonly InputSpec[] =>
  calculators.find((calculator) => calculator.id === id)?.inputs ?? [];

function withFields(id: string, fields: Record<string, Partial<FieldState>>): FormState {
  const form = initialFormState(inputsOf(id));
  return Object.fromEntries(
    Object.entries(form).map(([name, field]) => [
      name,
      { ...field, ...(fields[name] ?? {}) } as FieldState,
    ]),
  );
}

const datasetId = '9a1d3c55-7e20-4b1a-8c3f-5e0000000001';
const resolve: ResolveDataset = (id, column) =>
  id === datasetId && column === 'anomaly_k'
    ? { name: 'Station anomaly', points: [{ t: 2000, y: 0.1 }] }
    : undefined;

describe('buildInputs', () => {
  it('leaves out inputs at their default and sends the rest in the unit chosen', () => {
    const form = withFields('heat-flux-compare', {
      conductivity: { value: '2.5' },
      gradient: { value: '25', unit: 'K/m' },
    });
    // The global power stays at its default, so Fourier's law is not refused as a second way.
    expect(buildInputs(inputsOf('heat-flux-compare'), form, { for: 'request' })).toEqual({
      inputs: { conductivity: 2.5, gradient: { value: 25, unit: 'K/m' } },
      problems: {},
      missing: [],
    });
  });

  it('sends a range with its unit and distribution, and names what cannot be read', () => {
    const form = withFields('warming-from-forcing', {
      ecs: { ranged: true, low: '2.5', high: '4', distribution: 'normal' },
      tcr: { value: 'warm' },
      forcing: { ranged: true, low: '', high: '3' },
    });
    const built = buildInputs(inputsOf('warming-from-forcing'), form, { for: 'request' });
    expect(built.inputs).toEqual({ ecs: { low: 2.5, high: 4, distribution: 'normal' } });
    expect(built.problems).toEqual({
      tcr: 'Enter a number, e.g. 0.3 or 1.2e3',
      forcing: 'Enter both ends of the range as numbers, e.g. 0.28 and 0.31',
    });
  });

  it('sends a dataset column as a reference to the API and as its points to the browser', () => {
    const form = withFields('trend', {
      series: { source: { from: 'dataset', datasetId, column: 'anomaly_k', text: '' } },
      seriesUnit: { value: 'K' },
    });
    expect(buildInputs(inputsOf('trend'), form, { for: 'request' }).inputs).toEqual({
      series: { dataset: datasetId, column: 'anomaly_k' },
      seriesUnit: 'K',
    });
    expect(buildInputs(inputsOf('trend'), form, { for: 'run', resolve }).inputs).toEqual({
      series: [{ t: 2000, y: 0.1 }],
      seriesUnit: 'K',
    });
    // Until the dataset has loaded there is nothing to run.
    const loading = buildInputs(inputsOf('trend'), form, { for: 'run', resolve: () => undefined });
    expect(loading.missing).toEqual(['series']);
  });

  it('names the series of a comparison, pasted or from a dataset', () => {
    const form = withFields('pattern-compare', {});
    const field = form.series;
    if (field?.kind !== 'seriesList') throw new Error('series is a list');
    const [first, second] = field.items;
    const items = [
      {
        ...first!,
        name: 'Night',
        source: { from: 'dataset' as const, datasetId, column: 'anomaly_k', text: '' },
      },
      {
        ...second!,
        source: { from: 'pasted' as const, datasetId: '', column: '', text: '1979,0.1\n1980,0.2' },
      },
    ];
    const built = buildInputs(
      inputsOf('pattern-compare'),
      { ...form, series: { kind: 'seriesList', items } },
      {
        for: 'request',
      },
    );
    expect(built.inputs.series).toEqual([
      { dataset: datasetId, column: 'anomaly_k', name: 'Night' },
      {
        name: 'Pasted series',
        points: [
          { t: 1979, y: 0.1 },
          { t: 1980, y: 0.2 },
        ],
      },
    ]);
  });
});
