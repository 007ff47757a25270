import { describe, expect, it } from 'vitest';
import { parseGenerateArgs } from './generate-args';

describe('the generator’s command line', () => {
  it('reads the claim count, explainers, seed, end date and --append', () => {
    expect(parseGenerateArgs(['--claims', '100000'])).toEqual({ claims: 100_000, append: false });
    expect(parseGenerateArgs(['--claims', '5000', '--explainers', '500'])).toEqual({
      claims: 5000,
      explainers: 500,
      append: false,
    });
    expect(
      parseGenerateArgs(['--claims', '50', '--seed', '9', '--until', '2025-06-30', '--append']),
    ).toEqual({ claims: 50, seed: 9, until: new Date('2025-06-30T00:00:00Z'), append: true });
  });

  it('names the option and its rule when the line is wrong', () => {
    expect(() => parseGenerateArgs([])).toThrow('--claims is required');
    expect(() => parseGenerateArgs(['--claims', '1e5'])).toThrow(
      '--claims must be a whole number from 1 to 10000000, not “1e5”',
    );
    expect(() => parseGenerateArgs(['--claims', '0'])).toThrow(/from 1 to/);
    expect(() => parseGenerateArgs(['--claims', '5', '--seed', '-1'])).toThrow(/--seed/);
    expect(() => parseGenerateArgs(['--claims', '5', '--until', '2025-02-30x'])).toThrow(
      /--until must be a date/,
    );
    expect(() => parseGenerateArgs(['--claims', '5', '--claimz', '6'])).toThrow(/claimz/);
    expect(() => parseGenerateArgs(['--claims', '100', '--explainers', '51'])).toThrow(
      '--explainers must be a whole number from 0 to 50, not “51”',
    );
  });
});
