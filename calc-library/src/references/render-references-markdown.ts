import { type Reference } from './bibliography.js';

/**
 * Renders the bibliography as the Markdown of `REFERENCES.md`, one entry per key, so the
 * file can be regenerated from the code and a test can check that the two agree.
 *
 * @param referenceList the bibliography (normally {@link references})
 * @returns the Markdown text, ending with a newline
 * @example
 * renderReferencesMarkdown([{ key: 'Myhre1998', citation: 'Myhre, G. (1998).', doi: '10.1029/98GL01908' }])
 *   .split('\n').at(-2)
 * // => '- **Myhre1998**: Myhre, G. (1998). https://doi.org/10.1029/98GL01908'
 */
export function renderReferencesMarkdown(referenceList: readonly Reference[]): string {
  const header = [
    '# References',
    '',
    'The bibliography of `@skyledger/calc`. Every constant, default and formula in the',
    'library names one of these keys (AuthorYear). This file is generated from',
    '`src/references/bibliography.ts` by `npm run references -w calc-library`; a test checks',
    'that the two agree, so edit the source and regenerate.',
    '',
  ];
  const entries = referenceList.map((reference) => {
    const link =
      reference.doi !== undefined
        ? ` https://doi.org/${reference.doi}`
        : reference.url !== undefined
          ? ` ${reference.url}`
          : '';
    return `- **${reference.key}**: ${reference.citation}${link}`;
  });
  return [...header, ...entries].join('\n') + '\n';
}
