import { describe, expect, it } from 'vitest';
import { likelihoodPhrase, likelihoodTerms } from './likelihood.js';

describe('the IPCC calibrated likelihood terms', () => {
  it('carry the probabilities the IPCC gives them', () => {
    // IPCC AR6 WGI Summary for Policymakers, footnote 4 (the likelihood scale).
    expect(likelihoodTerms.find((entry) => entry.term === 'likely')).toMatchObject({
      low: 66,
      high: 100,
    });
    expect(likelihoodTerms.find((entry) => entry.term === 'very likely')).toMatchObject({
      low: 90,
      high: 100,
    });
    expect(likelihoodTerms.find((entry) => entry.term === 'about as likely as not')).toMatchObject({
      low: 33,
      high: 66,
    });
    expect(likelihoodTerms.find((entry) => entry.term === 'exceptionally unlikely')).toMatchObject({
      low: 0,
      high: 1,
    });
    expect(likelihoodPhrase('very likely')).toBe('very likely (90–100 %)');
  });
});
