import type { SeriesPoint } from '@skyledger/calc';
import { parseNumber } from './form-state';

export type ParsedSeries = { ok: true; points: SeriesPoint[] } | { ok: false; error: string };

/**
 * Points pasted as lines of `t,y` (comma, semicolon, tab or spaces between), t a decimal
 * year. Blank lines and lines starting with # are skipped, and so is a first line of
 * column names such as `year,anomaly`.
 *
 * @example parseSeriesText('year,anomaly\n1979,0.1\n1980 0.2').points
 * // => [{ t: 1979, y: 0.1 }, { t: 1980, y: 0.2 }]
 */
export function parseSeriesText(text: string): ParsedSeries {
  const points: SeriesPoint[] = [];
  const lines = text.split(/\r?\n/);
  for (const [index, line] of lines.entries()) {
    const trimmed = line.trim();
    if (trimmed === '' || trimmed.startsWith('#')) continue;
    const parts = trimmed.split(/\s*[,;\t]\s*|\s+/);
    const [t, y] = parts.map(parseNumber);
    if (parts.length === 2 && t !== undefined && y !== undefined) {
      points.push({ t, y });
      continue;
    }
    const isHeader = points.length === 0 && parts.every((part) => parseNumber(part) === undefined);
    if (isHeader) continue;
    return {
      ok: false,
      error: `Line ${index + 1} (“${trimmed}”) is not a time and a value: write t,y, e.g. 1998,0.42`,
    };
  }
  return { ok: true, points };
}
