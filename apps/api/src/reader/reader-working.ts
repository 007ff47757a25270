import { calculators, displayUnit, references, type InputSpec } from '@skyledger/calc';
import {
  type ReaderWorking,
  type ReaderWorkingInput,
  type ReaderWorkingOutput,
  type WorkingOutput,
} from '@skyledger/contracts';
import { type Working } from '../workings/entities/working.entity';

const number = new Intl.NumberFormat('en-GB', { maximumSignificantDigits: 4 });
const format = (value: number) => number.format(value);

/** An input as a reader reads it: value with unit, a range, a series' length, a choice. */
function formatInput(spec: InputSpec, value: unknown, datasetNote: string | null): string {
  const unit = 'unit' in spec && spec.unit ? ` ${displayUnit(spec.unit)}` : '';
  if (typeof value === 'number') return `${format(value)}${unit}`;
  if (typeof value === 'string') {
    const choice = spec.kind === 'choice' ? spec.choices.find((c) => c.value === value) : undefined;
    return choice?.label ?? value;
  }
  if (Array.isArray(value)) {
    if (spec.kind === 'lines') return (value as string[]).join('\n');
    if (spec.kind === 'seriesList') {
      return (value as Array<{ name: string; points: unknown[] }>)
        .map((series) => `${series.name} (${series.points.length} points)`)
        .join('; ');
    }
    const points = value as Array<{ t: number }>;
    const span = points.length
      ? `, ${format(points[0]!.t)}–${format(points[points.length - 1]!.t)}`
      : '';
    return `${points.length} points${span}${datasetNote ? ` from ${datasetNote}` : ''}`;
  }
  if (value && typeof value === 'object' && 'low' in value) {
    const range = value as { low: number; high: number; distribution?: string };
    return `${format(range.low)} to ${format(range.high)}${unit} (${range.distribution ?? 'uniform'} range)`;
  }
  return value === null || value === undefined ? 'not given' : JSON.stringify(value);
}

/**
 * A stored working as the reader page shows it: labels and units from the calculator's
 * declaration, and the published source of every input left at its default.
 */
export function toReaderWorking(
  working: Working,
  datasetNames: ReadonlyMap<string, string>,
): ReaderWorking {
  const calculator = calculators.find((candidate) => candidate.id === working.calculatorId);
  // Optional inputs the working left out played no part: they are not listed.
  const used = (calculator?.inputs ?? []).filter(
    (spec) => working.inputs[spec.name] !== null && working.inputs[spec.name] !== undefined,
  );
  const inputs: ReaderWorkingInput[] = used.map((spec) => {
    const value = working.inputs[spec.name];
    const ref = working.datasetRefs?.[spec.name]?.[0];
    const atDefault = JSON.stringify(value) === JSON.stringify(spec.default);
    const source =
      atDefault && spec.source ? references.find((r) => r.key === spec.source) : undefined;
    return {
      name: spec.name,
      label: spec.label,
      value: formatInput(
        spec,
        value,
        ref ? `“${datasetNames.get(ref.dataset) ?? 'a dataset'}”` : null,
      ),
      source: source?.citation ?? null,
    };
  });
  const outputs: ReaderWorkingOutput[] = Object.entries(
    working.outputs as Record<string, WorkingOutput>,
  ).map(([name, output]) => {
    const info = calculator?.outputs.find((candidate) => candidate.name === name);
    const band = output.band as { p5: number; p50: number; p95: number } | undefined;
    return {
      name,
      label: info?.label ?? name,
      kind: output.kind,
      value: output.value,
      unit: output.unit,
      band: band && typeof band.p5 === 'number' ? band : null,
      columns: output.columns ?? null,
    };
  });
  return {
    id: working.id,
    calculatorId: working.calculatorId,
    title: calculator?.title ?? working.calculatorId,
    libraryVersion: working.libraryVersion,
    note: working.note,
    inputs,
    steps: working.steps as ReaderWorking['steps'],
    outputs,
    cautions: working.cautions,
  };
}
