import { formatNumber } from '@skyledger/calc';
import type { BandBar } from './band-bar-chart';

/** Table headings for bars: the value, and the band's ends when any bar has one. */
export function bandColumns(unit: string, banded: boolean, valueLabel = 'Value'): string[] {
  const inUnit = (label: string) => (unit ? `${label} (${unit})` : label);
  return banded
    ? [inUnit('5th percentile'), inUnit('Median'), inUnit('95th percentile')]
    : [inUnit(valueLabel)];
}

/** One bar as a table row, under `bandColumns`. */
export function bandRow(bar: BandBar, banded: boolean): string[] {
  const cell = (value: number | undefined) => (value === undefined ? '—' : formatNumber(value));
  return banded
    ? [bar.label, cell(bar.low), cell(bar.value), cell(bar.high)]
    : [bar.label, cell(bar.value)];
}

/** What the error bars of a banded chart mean, for its text alternative. */
export const bandNote = ' Bars stand at the median; the lines span the 5th to 95th percentile.';
