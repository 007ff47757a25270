import { type Highlight } from '@skyledger/contracts';
import { normaliseTerm } from './normalise-term';

const SNIPPET_WORDS = 28;

/** Cuts `text` into runs, marking each word whose normalised form is one of `terms`. */
export function highlight(text: string, terms: ReadonlySet<string>): Highlight {
  const runs: Highlight = [];
  const push = (piece: string, match: boolean) => {
    if (!piece) return;
    const last = runs[runs.length - 1];
    if (last && last.match === match) last.text += piece;
    else runs.push({ text: piece, match });
  };
  let position = 0;
  for (const found of text.matchAll(/[\p{L}\p{N}]+/gu)) {
    push(text.slice(position, found.index), false);
    push(found[0], terms.has(normaliseTerm(found[0])));
    position = found.index + found[0].length;
  }
  push(text.slice(position), false);
  return runs;
}

/**
 * The passage of about 28 words around the first matched word, with the matches marked;
 * null when no word of `text` matched.
 */
export function snippet(text: string, terms: ReadonlySet<string>): Highlight | null {
  const words = [...text.matchAll(/[\p{L}\p{N}]+/gu)];
  const first = words.findIndex((word) => terms.has(normaliseTerm(word[0])));
  if (first < 0) return null;
  const start = Math.max(0, first - Math.floor(SNIPPET_WORDS / 3));
  const end = Math.min(words.length, start + SNIPPET_WORDS);
  const from = start === 0 ? 0 : words[start]!.index;
  const to = end === words.length ? text.length : words[end - 1]!.index + words[end - 1]![0].length;
  const runs = highlight(text.slice(from, to), terms);
  if (from > 0) runs.unshift({ text: '…', match: false });
  if (to < text.length) runs.push({ text: '…', match: false });
  return runs;
}
