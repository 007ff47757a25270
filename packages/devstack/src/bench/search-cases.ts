import { claimPatterns, places } from '@skyledger/seeds-demo/vocabulary';

/** A misspelled query and the word it stands for. */
export interface TypoCase {
  query: string;
  intended: string;
}

const wordsIn = (text: string) => text.match(/\p{L}+/gu) ?? [];

const phrasings = claimPatterns.flatMap((pattern) => pattern.phrasings);

/** Every word of the generated claims (summaries, texts and places), lower case, once. */
const vocabulary = [
  ...new Set(
    [...phrasings.flatMap((phrasing) => [phrasing.summary, phrasing.text]), ...places]
      .flatMap(wordsIn)
      .map((word) => word.toLowerCase()),
  ),
].sort();

/** Every `step`-th of the vocabulary's words of at least `minLength` letters, up to `count`. */
function pickWords(minLength: number, count: number): string[] {
  const long = vocabulary.filter((word) => word.length >= minLength);
  const step = Math.max(1, Math.floor(long.length / count));
  return long.filter((_, index) => index % step === 0).slice(0, count);
}

/**
 * The desk's search queries: words of the generated claims, common and rare, some as
 * pairs (every word must match), so both engines return many rows and few.
 */
export const deskQueries: string[] = [
  ...pickWords(5, 16),
  ...claimPatterns.slice(0, 8).map((pattern) =>
    wordsIn(pattern.phrasings[0]!.summary.replace(/\{\w+\}/g, ''))
      .filter((word) => word.length >= 4)
      .slice(0, 2)
      .join(' '),
  ),
];

/**
 * One typing slip, chosen by `n`: a letter left out, a letter doubled, or a letter
 * replaced by its neighbour in the alphabet. Each is one edit from the word.
 */
export function misspell(word: string, n: number): string {
  const at = Math.floor(word.length / 2);
  const letter = word[at]!;
  switch (n % 3) {
    case 0:
      return word.slice(0, at) + word.slice(at + 1);
    case 1:
      return word.slice(0, at) + letter + word.slice(at);
    default:
      return (
        word.slice(0, at) +
        (letter === 'z' ? 'a' : String.fromCharCode(letter.charCodeAt(0) + 1)) +
        word.slice(at + 1)
      );
  }
}

/** Misspelled one-word searches, from words long enough that a slip is still recognisable. */
export const typoQueries: TypoCase[] = pickWords(6, 24).map((intended, index) => ({
  query: misspell(intended, index),
  intended,
}));

/** What a reporter types while filing a claim: each phrasing's words, as said somewhere. */
const asSaid = (text: string) => text.replaceAll('{place}', 'Wenlow').replaceAll('{year}', '2016');

export const similarQueries: string[] = phrasings.map((phrasing) => asSaid(phrasing.text));

/**
 * The gist of each sentence typed in haste: its three longest words, each with one slip.
 * A slip in one word of a whole sentence tests nothing, as the other words find the claim.
 */
export const similarTypoQueries: TypoCase[] = phrasings.map((phrasing, index) => {
  const longest = [...new Set(wordsIn(asSaid(phrasing.text)).map((word) => word.toLowerCase()))]
    .sort((a, b) => b.length - a.length)
    .slice(0, 3);
  return {
    query: longest.map((word, n) => misspell(word, index + n)).join(' '),
    intended: longest[0]!,
  };
});
