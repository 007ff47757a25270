const isLeap = (year: number) => (year % 4 === 0 && year % 100 !== 0) || year % 400 === 0;
const daysBefore = [0, 31, 59, 90, 120, 151, 181, 212, 243, 273, 304, 334];

/**
 * A time cell as a decimal year: `1998` or `1998.5` as written; `1998-07` as the middle of
 * July (1998 + 6.5/12); `1998-07-15` as the middle of that day (1998 + 195.5/365). Null
 * when the cell is none of these.
 *
 * @example parseDecimalYear('2000-01') // 2000.0416666…
 */
export function parseDecimalYear(cell: string): number | null {
  const text = cell.trim();
  if (/^-?\d{1,4}(\.\d+)?$/.test(text)) return Number(text);
  const month = /^(\d{4})-(\d{2})$/.exec(text);
  if (month) {
    const [year, m] = [Number(month[1]), Number(month[2])];
    return m >= 1 && m <= 12 ? year + (m - 0.5) / 12 : null;
  }
  const day = /^(\d{4})-(\d{2})-(\d{2})$/.exec(text);
  if (day) {
    const [year, m, d] = [Number(day[1]), Number(day[2]), Number(day[3])];
    const date = new Date(Date.UTC(year, m - 1, d));
    if (date.getUTCMonth() !== m - 1 || date.getUTCDate() !== d) return null;
    const dayOfYear = daysBefore[m - 1]! + (m > 2 && isLeap(year) ? 1 : 0) + d;
    return year + (dayOfYear - 0.5) / (isLeap(year) ? 366 : 365);
  }
  return null;
}
