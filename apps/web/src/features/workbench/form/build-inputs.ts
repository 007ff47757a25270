import type { InputSpec, NamedSeries, NumberInputSpec } from '@skyledger/calc';
import type { DatasetSeriesRef } from '@skyledger/contracts';
import {
  holdsDefault,
  parseNumber,
  type FormState,
  type NumberFieldState,
  type SeriesSource,
} from './form-state';
import { parseSeriesText } from './parse-series-text';

/** A dataset column as a series the browser can run: its points and its label. */
export type ResolveDataset = (datasetId: string, column: string) => NamedSeries | undefined;

/**
 * Who the inputs are for: the browser's own run (dataset columns read into points) or the
 * API (dataset columns sent as `{ dataset, column }`, read again by the server).
 */
export type InputsTarget = { for: 'run'; resolve: ResolveDataset } | { for: 'request' };

export interface BuiltInputs {
  inputs: Record<string, unknown>;
  /** Inputs that cannot be read as typed, by name, with what to do about it. */
  problems: Record<string, string>;
  /** Series not chosen yet, or whose dataset is still loading: nothing to run yet. */
  missing: string[];
}

type Part = { value?: unknown; problem?: string; missing?: true };

function numberPart(field: NumberFieldState, spec: NumberInputSpec): Part {
  const unit = field.unit === spec.unit ? {} : { unit: field.unit };
  if (field.ranged) {
    const low = parseNumber(field.low);
    const high = parseNumber(field.high);
    if (low === undefined || high === undefined) {
      return { problem: 'Enter both ends of the range as numbers, e.g. 0.28 and 0.31' };
    }
    const distribution =
      field.distribution === 'uniform' ? {} : { distribution: field.distribution };
    return { value: { low, high, ...unit, ...distribution } };
  }
  if (field.value.trim() === '' || holdsDefault(field, spec)) return {};
  const value = parseNumber(field.value);
  if (value === undefined) return { problem: 'Enter a number, e.g. 0.3 or 1.2e3' };
  return { value: field.unit === spec.unit ? value : { value, ...unit } };
}

function seriesPart(
  source: SeriesSource,
  name: string,
  target: InputsTarget,
): Part & { value?: NamedSeries | DatasetSeriesRef } {
  if (source.from === 'pasted') {
    if (source.text.trim() === '') return { missing: true };
    const parsed = parseSeriesText(source.text);
    if (!parsed.ok) return { problem: parsed.error };
    return { value: { name: name.trim() || 'Pasted series', points: parsed.points } };
  }
  if (source.datasetId === '' || source.column === '') return { missing: true };
  if (target.for === 'request') {
    const named = name.trim() ? { name: name.trim() } : {};
    return { value: { dataset: source.datasetId, column: source.column, ...named } };
  }
  const series = target.resolve(source.datasetId, source.column);
  if (!series) return { missing: true };
  return { value: name.trim() ? { ...series, name: name.trim() } : series };
}

function partOf(spec: InputSpec, form: FormState, target: InputsTarget): Part {
  const field = form[spec.name];
  if (!field) return {};
  switch (field.kind) {
    case 'number':
      return spec.kind === 'number' ? numberPart(field, spec) : {};
    case 'choice':
    case 'text':
      return field.value === spec.default ? {} : { value: field.value };
    case 'lines':
      return { value: field.text.split(/\r?\n/) };
    case 'series': {
      const part = seriesPart(field.source, '', target);
      // A single series is only its points; the API reads a dataset reference instead.
      const value = part.value;
      return value && 'points' in value ? { value: value.points } : part;
    }
    case 'seriesList': {
      const parts = field.items.map((item) => seriesPart(item.source, item.name, target));
      const problem = parts.find((part) => part.problem)?.problem;
      if (problem) return { problem };
      if (parts.some((part) => part.missing)) return { missing: true };
      return { value: parts.map((part) => part.value) };
    }
  }
}

/**
 * The calculator inputs the form stands for. Inputs left at their declared default are
 * left out, as if never touched (some calculators refuse two alternative inputs at once,
 * e.g. a global power and a conductivity); the library fills them in, and records them.
 */
export function buildInputs(
  specs: readonly InputSpec[],
  form: FormState,
  target: InputsTarget,
): BuiltInputs {
  const built: BuiltInputs = { inputs: {}, problems: {}, missing: [] };
  for (const spec of specs) {
    const part = partOf(spec, form, target);
    if (part.problem) built.problems[spec.name] = part.problem;
    else if (part.missing) built.missing.push(spec.name);
    else if (part.value !== undefined) built.inputs[spec.name] = part.value;
  }
  return built;
}
