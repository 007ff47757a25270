import { uniformFloat64 } from 'pure-rand/distribution/uniformFloat64';
import { uniformInt } from 'pure-rand/distribution/uniformInt';
import { xoroshiro128plus } from 'pure-rand/generator/xoroshiro128plus';
import { type JumpableRandomGenerator } from 'pure-rand/types/JumpableRandomGenerator';

/**
 * The kinds of rows the generator makes, each drawn from a random stream of its own, so
 * adding a kind (or changing how one kind is drawn) leaves the others' rows as they were
 * for the same seed. Append new kinds at the end: a stream's position is its identity.
 */
export const randomStreams = [
  'people',
  'claimants',
  'sources',
  'claims',
  'workings',
  'verdicts',
  'signoffs',
  'publications',
] as const;
export type RandomStream = (typeof randomStreams)[number];

/**
 * A seeded random source for generated rows, so a generated desk is the same on every
 * run with the same seed. xoroshiro128+ from pure-rand; the streams are its jumps
 * (2^64 draws apart), so they never overlap.
 */
export class SeededRandom {
  private constructor(private readonly generator: JumpableRandomGenerator) {}

  static stream(seed: number, stream: RandomStream): SeededRandom {
    const generator = xoroshiro128plus(seed);
    for (let jumps = 0; jumps <= randomStreams.indexOf(stream); jumps += 1) generator.jump();
    return new SeededRandom(generator);
  }

  /** A number in [0, 1). */
  next(): number {
    return uniformFloat64(this.generator);
  }

  /** An integer in [0, n). */
  below(n: number): number {
    return uniformInt(this.generator, 0, n - 1);
  }

  chance(probability: number): boolean {
    return this.next() < probability;
  }

  pick<T>(items: readonly T[]): T {
    if (items.length === 0) throw new Error('pick() needs at least one item');
    return items[this.below(items.length)]!;
  }

  /** Up to `count` different items, in the order drawn. */
  pickDistinct<T>(items: readonly T[], count: number, skew = 1): T[] {
    const picked = new Set<T>();
    for (let tries = 0; picked.size < Math.min(count, items.length) && tries < count * 4; tries++) {
      picked.add(items[this.skewedIndex(items.length, skew)]!);
    }
    return [...picked];
  }

  /** One of the keys, with probability proportional to its weight. */
  weighted<K extends string>(weights: Readonly<Record<K, number>>): K {
    const entries = Object.entries(weights) as Array<[K, number]>;
    const total = entries.reduce((sum, [, weight]) => sum + weight, 0);
    let ticket = this.next() * total;
    for (const [key, weight] of entries) {
      ticket -= weight;
      if (ticket < 0) return key;
    }
    return entries[entries.length - 1]![0];
  }

  /**
   * An index in [0, n) where low indexes come up far more often (a few claimants make
   * most claims): u^skew stretched over n.
   */
  skewedIndex(n: number, skew = 3): number {
    return Math.min(n - 1, Math.floor(n * this.next() ** skew));
  }

  /** A version-4 UUID (RFC 9562 §5.4) made from this stream, so ids repeat with the seed. */
  uuid(): string {
    const hex = Array.from({ length: 4 }, () =>
      (this.generator.next() >>> 0).toString(16).padStart(8, '0'),
    ).join('');
    const variant = ((parseInt(hex[16]!, 16) & 0x3) | 0x8).toString(16);
    return `${hex.slice(0, 8)}-${hex.slice(8, 12)}-4${hex.slice(13, 16)}-${variant}${hex.slice(17, 20)}-${hex.slice(20, 32)}`;
  }
}
