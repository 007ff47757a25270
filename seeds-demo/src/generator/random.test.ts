import { describe, expect, it } from 'vitest';
import { SeededRandom } from './random';

const draws = (random: SeededRandom) => Array.from({ length: 20 }, () => random.below(2 ** 31));

describe('SeededRandom', () => {
  it('repeats a stream for the same seed, and keeps seeds and streams apart', () => {
    const stream = (seed: number, name: 'people' | 'claims') =>
      draws(SeededRandom.stream(seed, name));
    expect(stream(7, 'claims')).toEqual(stream(7, 'claims'));
    expect(stream(7, 'claims')).not.toEqual(stream(8, 'claims'));
    expect(stream(7, 'claims')).not.toEqual(stream(7, 'people'));
  });

  it('makes well-formed version-4 UUIDs that do not repeat', () => {
    const random = SeededRandom.stream(1, 'claims');
    const ids = Array.from({ length: 2000 }, () => random.uuid());
    for (const id of ids) {
      expect(id).toMatch(/^[0-9a-f]{8}-[0-9a-f]{4}-4[0-9a-f]{3}-[89ab][0-9a-f]{3}-[0-9a-f]{12}$/);
    }
    expect(new Set(ids).size).toBe(ids.length);
  });

  it('draws within range, never a key of weight zero, and distinct picks', () => {
    const random = SeededRandom.stream(3, 'sources');
    const seen = new Set<string>();
    for (let n = 0; n < 2000; n += 1) {
      const index = random.below(5);
      expect(index).toBeGreaterThanOrEqual(0);
      expect(index).toBeLessThan(5);
      expect(random.skewedIndex(5)).toBeLessThan(5);
      seen.add(random.weighted({ often: 5, sometimes: 1, never: 0 }));
      const picked = random.pickDistinct(['a', 'b', 'c', 'd'], 3, 2);
      expect(new Set(picked).size).toBe(picked.length);
      expect(picked.length).toBeGreaterThan(0);
    }
    expect([...seen].sort()).toEqual(['often', 'sometimes']);
  });
});
