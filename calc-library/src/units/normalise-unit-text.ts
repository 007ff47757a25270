/**
 * Tidies a unit as typed by a person so that equal units compare equal: trims, collapses
 * runs of spaces, and reads the common year abbreviations as mathjs's `year`.
 *
 * @param unit the unit as given
 * @returns the tidied unit
 * @example
 * normaliseUnitText('  W /  m^2 ') // => 'W / m^2'
 * normaliseUnitText('yr') // => 'year'
 */
export function normaliseUnitText(unit: string): string {
  return unit
    .trim()
    .replace(/\s+/g, ' ')
    .replace(/\b(?:yr|yrs)\b/g, 'year');
}
