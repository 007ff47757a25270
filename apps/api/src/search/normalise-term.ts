/** Lower case without accents: how both the index and the highlighter compare words. */
export function normaliseTerm(term: string): string {
  return term
    .normalize('NFD')
    .replace(/\p{M}+/gu, '')
    .toLowerCase();
}

/** Words as the index sees them: runs of letters and digits. */
export const wordPattern = /[\p{L}\p{N}]+/gu;

export function wordsOf(text: string): string[] {
  return (text.match(wordPattern) ?? []).map(normaliseTerm);
}
