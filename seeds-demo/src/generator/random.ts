/**
 * A small seeded pseudo-random generator, so a generated desk is the same on every run
 * with the same seed. sfc32 (Chris Doty-Humphrey's Small Fast Counting generator, from
 * PractRand), its state filled from the seed by a splitmix-style counter hashed with
 * MurmurHash3's 32-bit finaliser.
 */
export class SeededRandom {
  private a: number;
  private b: number;
  private c: number;
  private d: number;

  constructor(seed: number) {
    let state = seed >>> 0;
    const splitmix = () => {
      state = (state + 0x9e3779b9) >>> 0;
      let z = state;
      z = Math.imul(z ^ (z >>> 16), 0x85ebca6b) >>> 0;
      z = Math.imul(z ^ (z >>> 13), 0xc2b2ae35) >>> 0;
      return (z ^ (z >>> 16)) >>> 0;
    };
    this.a = splitmix();
    this.b = splitmix();
    this.c = splitmix();
    this.d = splitmix();
    for (let i = 0; i < 12; i += 1) this.uint32();
  }

  /** The next 32-bit unsigned integer. */
  uint32(): number {
    const t = (((this.a + this.b) >>> 0) + this.d) >>> 0;
    this.d = (this.d + 1) >>> 0;
    this.a = this.b ^ (this.b >>> 9);
    this.b = (this.c + (this.c << 3)) >>> 0;
    this.c = ((this.c << 21) | (this.c >>> 11)) >>> 0;
    this.c = (this.c + t) >>> 0;
    return t;
  }

  /** A number in [0, 1). */
  next(): number {
    return this.uint32() / 0x1_0000_0000;
  }

  /** An integer in [0, n). */
  below(n: number): number {
    return Math.floor(this.next() * n);
  }

  chance(probability: number): boolean {
    return this.next() < probability;
  }

  pick<T>(items: readonly T[]): T {
    if (items.length === 0) throw new Error('pick() needs at least one item');
    return items[this.below(items.length)]!;
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

  /** A version-4 UUID made from this generator, so ids repeat with the seed. */
  uuid(): string {
    const hex = Array.from({ length: 4 }, () => this.uint32().toString(16).padStart(8, '0')).join(
      '',
    );
    const variant = ((parseInt(hex[16]!, 16) & 0x3) | 0x8).toString(16);
    return `${hex.slice(0, 8)}-${hex.slice(8, 12)}-4${hex.slice(13, 16)}-${variant}${hex.slice(17, 20)}-${hex.slice(20, 32)}`;
  }
}
