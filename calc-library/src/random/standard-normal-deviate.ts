import { type UniformRandom } from './seeded-random.js';

/**
 * Draws one standard normal deviate (mean 0, standard deviation 1) by the Box–Muller
 * transform of two uniform numbers.
 *
 * Formula: z = √(−2 ln u₁) cos(2π u₂), with u₁ in (0, 1]
 *
 * @param random a uniform source in [0, 1)
 * @returns a normal deviate
 * @example
 * standardNormalDeviate(() => 0.5) // => -1.1774100225154747
 * @see Box1958
 */
export function standardNormalDeviate(random: UniformRandom): number {
  // 1 − u maps [0, 1) to (0, 1], so the logarithm is always finite.
  const firstUniform = 1 - random();
  const secondUniform = random();
  return Math.sqrt(-2 * Math.log(firstUniform)) * Math.cos(2 * Math.PI * secondUniform);
}
