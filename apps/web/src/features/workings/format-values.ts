import {
  displayUnit,
  formatNumber,
  formatQuantity,
  type Band,
  type InputSpec,
  type ListBand,
  type NormalisedRange,
} from '@skyledger/calc';
import type { WorkingOutput } from '@skyledger/contracts';

/** A number with its unit as the steps write it: `287.3 K`, `2.72 W/m²`. */
export function quantityText(value: number, unit: string): string {
  return formatQuantity(value, displayUnit(unit));
}

function isObject(value: unknown): value is Record<string, unknown> {
  return typeof value === 'object' && value !== null;
}

export function isBand(value: unknown): value is Band {
  return isObject(value) && typeof value.p5 === 'number' && typeof value.p95 === 'number';
}

export function isListBand(value: unknown): value is ListBand {
  return isObject(value) && Array.isArray(value.p5) && Array.isArray(value.p95);
}

function isRange(value: unknown): value is NormalisedRange {
  return isObject(value) && typeof value.low === 'number' && typeof value.high === 'number';
}

/** `284.8 to 290 K (5th to 95th percentile), median 287.3 K` */
export function bandText(band: Band, unit: string): string {
  const span = `${formatNumber(band.p5)} to ${quantityText(band.p95, unit)}`;
  return `${span} (5th to 95th percentile), median ${quantityText(band.p50, unit)}`;
}

/** One cell of a table output or list: numbers rounded for reading, yes/no for flags. */
export function cellText(value: unknown): string {
  if (typeof value === 'number') return formatNumber(value);
  if (typeof value === 'boolean') return value ? 'yes' : 'no';
  if (value === null || value === undefined) return '—';
  return String(value);
}

/** An output's value on one line: what a re-run compares, before and after. */
export function outputText(output: WorkingOutput | null): string {
  if (!output) return 'not given';
  switch (output.kind) {
    case 'number': {
      const value = quantityText(Number(output.value), output.unit);
      return isBand(output.band) ? `${value}; ${bandText(output.band, output.unit)}` : value;
    }
    case 'list': {
      const values = Array.isArray(output.value) ? output.value.map(cellText).join(', ') : '';
      return output.unit ? `${values} ${displayUnit(output.unit)}` : values;
    }
    case 'text':
      return String(output.value);
    case 'table':
      return Array.isArray(output.value)
        ? `a table of ${output.value.length} ${output.value.length === 1 ? 'row' : 'rows'}`
        : 'a table';
  }
}

const distributionWords: Record<NormalisedRange['distribution'], string> = {
  uniform: 'a uniform range',
  normal: 'a normal range, 5th to 95th percentile',
  lognormal: 'a lognormal range, 5th to 95th percentile',
};

/**
 * An input as it was used: numbers and ranges in the declared unit, a choice by its
 * label, lines one per line. Series are shown by the section itself, with their dataset.
 */
export function inputText(spec: InputSpec | undefined, value: unknown): string {
  const unit = spec?.kind === 'number' ? spec.unit : '';
  if (value === undefined || value === null) return 'not given';
  if (typeof value === 'number') return quantityText(value, unit);
  if (isRange(value)) {
    return `${formatNumber(value.low)} to ${quantityText(value.high, unit)} (${distributionWords[value.distribution] ?? value.distribution})`;
  }
  if (spec?.kind === 'choice') {
    return spec.choices.find((choice) => choice.value === value)?.label ?? String(value);
  }
  if (Array.isArray(value) && value.every((line) => typeof line === 'string')) {
    return value.join('\n');
  }
  if (Array.isArray(value)) return `${value.length} values`;
  return String(value);
}
