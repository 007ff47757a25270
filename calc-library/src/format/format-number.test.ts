import { describe, expect, it } from 'vitest';
import { formatNumber, formatQuantity } from './format-number.js';

describe('formatNumber', () => {
  it('writes numbers for readers', () => {
    expect(formatNumber(238.175)).toBe('238.2');
    expect(formatNumber(5.670374419e-8)).toBe('5.67 × 10⁻⁸');
    expect(formatNumber(-0.0354, 2)).toBe('−0.035');
    expect(formatNumber(9999.7)).toBe('10000');
    expect(formatNumber(47000)).toBe('47000');
    expect(formatNumber(5.1e14)).toBe('5.1 × 10¹⁴');
    expect(formatNumber(0)).toBe('0');
    expect(formatQuantity(238.175, 'W/m²')).toBe('238.2 W/m²');
  });
});
