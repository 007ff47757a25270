/** The cause of a change of absorbed sunlight whose fingerprint is described. */
export type SunlightCause =
  'brighter-sun' | 'dimmer-sun' | 'darker-planet' | 'brighter-planet' | 'no-change';

/**
 * The pattern of temperature change a change of absorbed sunlight would leave, in plain
 * words, so that a claim ("it's the sun") can be set against the observed fingerprint.
 * Written for Skyledger after the physics reviewed by Gray et al. (2010) and AR6 chapter 7.
 *
 * @param cause what changed the absorbed sunlight
 * @returns one paragraph of plain text
 * @example
 * expectedSunlightPattern('no-change') // => 'Absorbed sunlight does not change, so this cause leaves no warming pattern.'
 * @see Gray2010, Forster2021
 */
export function expectedSunlightPattern(cause: SunlightCause): string {
  switch (cause) {
    case 'brighter-sun':
      return (
        'A brighter sun heats the whole depth of the atmosphere from above, the stratosphere ' +
        'included, where ozone absorbs more ultraviolet. Its extra heat arrives in daylight, so ' +
        'days and summers would warm faster than nights and winters, and the upper atmosphere ' +
        'would warm along with the surface.'
      );
    case 'dimmer-sun':
      return (
        'A dimmer sun would cool the whole depth of the atmosphere, the stratosphere included, ' +
        'and would cool days and summers more than nights and winters.'
      );
    case 'darker-planet':
      return (
        'A darker planet (less reflection by ice, cloud or haze) absorbs more sunlight, mostly ' +
        'near the surface and in the lower air. The warming comes in daylight and in the sunlit ' +
        'season, is strongest where the reflecting surface was lost, and does not warm the ' +
        'stratosphere.'
      );
    case 'brighter-planet':
      return (
        'A brighter planet (more reflection by ice, cloud or haze) absorbs less sunlight and ' +
        'cools the surface and the lower air, most in daylight and in the sunlit season, with ' +
        'little effect on the stratosphere.'
      );
    case 'no-change':
      return 'Absorbed sunlight does not change, so this cause leaves no warming pattern.';
  }
}

/**
 * The fingerprint of greenhouse warming, in plain words, for comparison with a change of
 * sunlight.
 *
 * @returns one paragraph of plain text
 * @example
 * greenhouseWarmingPattern().startsWith('More greenhouse gas') // => true
 * @see Forster2021, Santer2008
 */
export function greenhouseWarmingPattern(): string {
  return (
    'More greenhouse gas holds back outgoing infrared at every hour of the day: the surface ' +
    'and the lower atmosphere warm while the stratosphere cools, and nights and winters tend ' +
    'to warm faster than days and summers. A stratosphere that cools while the surface warms ' +
    'fits this pattern and not that of a brighter sun.'
  );
}
