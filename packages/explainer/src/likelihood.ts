/**
 * The IPCC's calibrated likelihood language, with the probability each term stands for.
 * Explainers use these words only with their meaning, and show the range beside them.
 *
 * @see IPCC AR6 WGI, Summary for Policymakers, footnote 4; Mastrandrea et al. 2010,
 *   Guidance Note for Lead Authors of the IPCC Fifth Assessment Report, Table 1.
 */
export const likelihoodTerms = [
  { term: 'virtually certain', low: 99, high: 100 },
  { term: 'extremely likely', low: 95, high: 100 },
  { term: 'very likely', low: 90, high: 100 },
  { term: 'likely', low: 66, high: 100 },
  { term: 'about as likely as not', low: 33, high: 66 },
  { term: 'unlikely', low: 0, high: 33 },
  { term: 'very unlikely', low: 0, high: 10 },
  { term: 'extremely unlikely', low: 0, high: 5 },
  { term: 'exceptionally unlikely', low: 0, high: 1 },
] as const;

export type LikelihoodTerm = (typeof likelihoodTerms)[number]['term'];

/** The term with its range as an explainer prints it: "very likely (90–100 %)". */
export function likelihoodPhrase(term: LikelihoodTerm): string {
  const entry = likelihoodTerms.find((candidate) => candidate.term === term)!;
  return `${entry.term} (${entry.low}–${entry.high} %)`;
}
