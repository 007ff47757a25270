const isLeap = (year: number) => (year % 4 === 0 && year % 100 !== 0) || year % 400 === 0;
const pad = (n: number) => String(n).padStart(2, '0');
const isWhole = (x: number) => Math.abs(x - Math.round(x)) < 1e-6;

/**
 * A decimal year as the CSV most likely wrote it: `1998` and `1998.5` as they are; the
 * middle of a month (what the API makes of `1998-07`) as `1998-07`; the middle of a day
 * (`1998-07-15`) as that date; anything else to three decimals.
 *
 * @example formatDecimalYear(2000 + 6.5 / 12) // => '2000-07'
 */
export function formatDecimalYear(t: number): string {
  const plain = String(t);
  if (!plain.includes('.') || plain.split('.')[1]!.length <= 3) return plain.replace(/^-/, '−');
  const year = Math.floor(t);
  const month = (t - year) * 12 + 0.5;
  if (isWhole(month)) return `${year}-${pad(Math.round(month))}`;
  const dayOfYear = (t - year) * (isLeap(year) ? 366 : 365) + 0.5;
  if (isWhole(dayOfYear)) {
    const date = new Date(Date.UTC(year, 0, Math.round(dayOfYear)));
    return date.toISOString().slice(0, 10);
  }
  return t.toFixed(3);
}
