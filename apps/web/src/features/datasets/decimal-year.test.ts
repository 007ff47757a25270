import { describe, expect, it } from 'vitest';
import { formatDecimalYear } from './decimal-year';

// The expected texts invert apps/api/src/datasets/parse-time.ts, which reads `1998-07` as
// 1998 + 6.5/12 and `1998-07-15` as 1998 + (day of year − 0.5)/365.
describe('formatDecimalYear', () => {
  it('keeps years and short decimals as written', () => {
    expect(formatDecimalYear(1998)).toBe('1998');
    expect(formatDecimalYear(1998.5)).toBe('1998.5');
  });

  it('writes the middle of a month as the month', () => {
    expect(formatDecimalYear(2000 + 0.5 / 12)).toBe('2000-01');
    expect(formatDecimalYear(1998 + 6.5 / 12)).toBe('1998-07');
  });

  it('writes the middle of a day as the date, leap years included', () => {
    // 15 July 1998 is day 196 of a common year.
    expect(formatDecimalYear(1998 + 195.5 / 365)).toBe('1998-07-15');
    // 1 March 2000 is day 61 of a leap year.
    expect(formatDecimalYear(2000 + 60.5 / 366)).toBe('2000-03-01');
  });

  it('rounds anything else to three decimals', () => {
    expect(formatDecimalYear(1998.123456)).toBe('1998.123');
  });
});
