import { describe, expect, it } from 'vitest';
import { formatBytes } from './format-bytes';

describe('formatBytes', () => {
  it.each([
    [1, '1 byte'],
    [512, '512 bytes'],
    [1024, '1.0 KB'],
    [18_842, '18 KB'],
    [2_202_009, '2.1 MB'],
    [20 * 1024 * 1024, '20 MB'],
  ])('writes %i as %s', (size, expected) => {
    expect(formatBytes(size)).toBe(expected);
  });
});
