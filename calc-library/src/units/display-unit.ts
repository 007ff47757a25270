const superscriptDigits: Readonly<Record<string, string>> = {
  '0': '⁰',
  '1': '¹',
  '2': '²',
  '3': '³',
  '4': '⁴',
  '5': '⁵',
  '6': '⁶',
  '7': '⁷',
  '8': '⁸',
  '9': '⁹',
  '-': '⁻',
};

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
    .replace(/\^(-?\d+)/g, (_match, power: string) =>
      [...power].map((character) => superscriptDigits[character] ?? character).join(''),
    )
    .replace(/\bdegC\b/g, '°C')
    .replace(/\bdegF\b/g, '°F');
}
