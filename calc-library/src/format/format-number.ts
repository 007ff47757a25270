import { superscript } from './superscript.js';

function trimTrailingZeros(text: string): string {
  return text.includes('.') ? text.replace(/\.?0+$/, '') : text;
}

/**
 * Writes a number for the steps a reader follows: `significantDigits` significant digits,
 * trailing zeros dropped, powers of ten for very large or small numbers, and a true minus sign.
 * Only for display: results keep full precision.
 *
 * @param value the number
 * @param significantDigits how many significant digits to show (1–15), 4 unless told
 * @returns the number as text
 * @example
 * formatNumber(238.175) // => '238.2'
 * formatNumber(5.670374419e-8) // => '5.67 × 10⁻⁸'
 * formatNumber(-0.0354, 2) // => '−0.035'
 */
export function formatNumber(value: number, significantDigits = 4): string {
  if (Number.isNaN(value)) return 'NaN';
  if (!Number.isFinite(value)) return value > 0 ? '∞' : '−∞';
  if (value === 0) return '0';
  const magnitude = Math.abs(value);
  let text: string;
  if (magnitude >= 1e6 || magnitude < 1e-3) {
    const [mantissa = '', exponent = ''] = value.toExponential(significantDigits - 1).split('e');
    const power = superscript(String(Number(exponent)));
    text = `${trimTrailingZeros(mantissa)} × 10${power}`;
  } else if (magnitude >= 10 ** significantDigits) {
    text = String(Math.round(value));
  } else {
    // toPrecision switches to exponent form when rounding carries to the next power of ten.
    const precise = value.toPrecision(significantDigits);
    text = precise.includes('e') ? String(Number(precise)) : trimTrailingZeros(precise);
  }
  return text.replace(/^-/, '−');
}

/**
 * Writes a number with its unit, e.g. `238.2 W/m²`.
 *
 * @example
 * formatQuantity(238.175, 'W/m²') // => '238.2 W/m²'
 */
export function formatQuantity(value: number, unit: string, significantDigits = 4): string {
  const number = formatNumber(value, significantDigits);
  return unit === '' ? number : `${number} ${unit}`;
}
