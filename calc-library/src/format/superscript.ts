const superscriptCharacters: Readonly<Record<string, string>> = {
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
 * Writes digits and a minus sign as superscripts, for powers in steps and units.
 *
 * @param text digits, optionally with a leading minus
 * @returns the same as superscript characters; other characters are kept
 * @example
 * superscript('-8') // => '⁻⁸'
 */
export function superscript(text: string): string {
  return [...text].map((character) => superscriptCharacters[character] ?? character).join('');
}
