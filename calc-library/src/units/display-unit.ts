import { superscript } from '../format/superscript.js';

/**
 * Writes a unit for readers: powers as superscripts, degrees with their sign.
 *
 * @param unit a unit in mathjs notation
 * @returns the unit as shown in steps
 * @example
 * displayUnit('W/(m^2 K^4)') // => 'W/(m² K⁴)'
 * displayUnit('degC') // => '°C'
 */
export function displayUnit(unit: string): string {
  return unit
    .replace(/\^(-?\d+)/g, (_match, power: string) => superscript(power))
    .replace(/\bdegC\b/g, '°C')
    .replace(/\bdegF\b/g, '°F');
}
