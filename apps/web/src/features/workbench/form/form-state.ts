import type { Distribution, InputSpec, NumberInputSpec } from '@skyledger/calc';

/** Where a series comes from: a column of a dataset on the desk, or pasted `t,y` lines. */
export interface SeriesSource {
  from: 'dataset' | 'pasted';
  datasetId: string;
  /** The dataset column's key (its CSV header). */
  column: string;
  text: string;
}

export interface NumberFieldState {
  kind: 'number';
  ranged: boolean;
  value: string;
  low: string;
  high: string;
  unit: string;
  distribution: Distribution;
}

export interface SeriesListItem {
  /** Stable across edits, for React; not sent. */
  key: string;
  name: string;
  source: SeriesSource;
}

export type FieldState =
  | NumberFieldState
  | { kind: 'choice'; value: string }
  | { kind: 'text'; value: string }
  | { kind: 'series'; source: SeriesSource }
  | { kind: 'seriesList'; items: SeriesListItem[] }
  | { kind: 'lines'; text: string };

/** What the form holds, by input name: text as typed, so a half-typed number stays on screen. */
export type FormState = Readonly<Record<string, FieldState>>;

/** A number as the form writes it: twelve significant digits at most, no binary noise. */
export function plainNumber(value: number): string {
  return String(Number(value.toPrecision(12)));
}

export const emptySeriesSource: SeriesSource = {
  from: 'dataset',
  datasetId: '',
  column: '',
  text: '',
};

let itemCount = 0;
export function newSeriesListItem(): SeriesListItem {
  itemCount += 1;
  return { key: `series-${itemCount}`, name: '', source: emptySeriesSource };
}

function initialField(spec: InputSpec): FieldState {
  switch (spec.kind) {
    case 'number':
      return {
        kind: 'number',
        ranged: false,
        value: spec.default === null ? '' : plainNumber(spec.default),
        low: '',
        high: '',
        unit: spec.unit,
        distribution: 'uniform',
      };
    case 'choice':
      return { kind: 'choice', value: spec.default };
    case 'text':
      return { kind: 'text', value: spec.default };
    case 'series':
      return { kind: 'series', source: emptySeriesSource };
    case 'seriesList':
      return {
        kind: 'seriesList',
        items: Array.from({ length: spec.minSeries }, newSeriesListItem),
      };
    case 'lines':
      return { kind: 'lines', text: spec.default.join('\n') };
  }
}

/** Every input at its default, as the calculator declares it. */
export function initialFormState(inputs: readonly InputSpec[]): FormState {
  return Object.fromEntries(inputs.map((spec) => [spec.name, initialField(spec)]));
}

/** True when a number field still holds the declared default, in the declared unit. */
export function holdsDefault(field: NumberFieldState, spec: NumberInputSpec): boolean {
  return (
    !field.ranged &&
    field.unit === spec.unit &&
    spec.default !== null &&
    parseNumber(field.value) === Number(plainNumber(spec.default))
  );
}

/** A number as a person types it (a true minus sign allowed); undefined when empty or not one. */
export function parseNumber(text: string): number | undefined {
  const trimmed = text.trim().replace(/^−/, '-');
  if (trimmed === '') return undefined;
  const value = Number(trimmed);
  return Number.isFinite(value) ? value : undefined;
}
