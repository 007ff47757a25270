import MiniSearch from 'minisearch';
import { wordsOf } from '../normalise-term';
import { CompactIndex, type TermGroup } from './compact-index';

/**
 * The embedded index scores as MiniSearch 7 scores (BM25 with k 1.2, b 0.7, d 0.5, prefix
 * and typo weights, times the number of query words matched). MiniSearch, from the
 * registry, is the reference: both index the same invented corpus and must rank it alike.
 */
const fields = ['title', 'text', 'claimant'] as const;
const boosts = [3, 2, 1.5];

const words = (
  'warming ocean oceans heat volcano volcanoes sun solar cycle cosmic rays cloud clouds ' +
  'carbon dioxide methane record records station stations thermometer paused stopped ' +
  'since decade hotter colder ice sheet sea level rise glacier core interior flux ' +
  'greenhouse effect water vapour forcing sensitivity trend marrowby council farm'
).split(' ');

/** A small linear congruential generator, so the corpus is the same on every run. */
function random(seed: number) {
  let state = seed;
  return () => {
    state = (state * 1_103_515_245 + 12_345) % 2_147_483_648;
    return state / 2_147_483_648;
  };
}

const next = random(20_261_202);
const phrase = (length: number) =>
  Array.from({ length }, () => words[Math.floor(next() * words.length)]).join(' ');
const corpus = Array.from({ length: 400 }, (_, id) => ({
  id,
  title: phrase(3 + Math.floor(next() * 6)),
  text: phrase(8 + Math.floor(next() * 20)),
  claimant: next() < 0.2 ? '' : phrase(2),
}));

const mini = new MiniSearch<(typeof corpus)[number]>({
  fields: [...fields],
  tokenize: (text) => wordsOf(text),
  processTerm: (term) => term,
  searchOptions: { boost: { title: 3, text: 2, claimant: 1.5 } },
});
mini.addAll(corpus);

const index = new CompactIndex(fields.length, wordsOf);
for (const document of corpus) index.add(fields.map((field) => document[field]));

interface Options {
  prefix: boolean;
  typos: number;
}

function compactResults(query: string, options: Options, all: boolean) {
  const groups: TermGroup[] = wordsOf(query).map((word) => [
    { derived: index.derive(word, options) },
  ]);
  const results: Array<{ id: number; score: number }> = [];
  index.search(
    groups,
    all,
    boosts,
    () => true,
    (slot, score) => results.push({ id: slot, score }),
  );
  return results.sort((a, b) => b.score - a.score || a.id - b.id);
}

function miniResults(query: string, options: Options, all: boolean) {
  return mini
    .search(query, {
      prefix: options.prefix,
      fuzzy: options.typos,
      combineWith: all ? 'AND' : 'OR',
    })
    .map(({ id, score }) => ({ id: id as number, score }))
    .sort((a, b) => b.score - a.score || a.id - b.id);
}

describe('CompactIndex against MiniSearch', () => {
  const cases: Array<[string, Options, boolean]> = [
    ['warming', { prefix: false, typos: 0 }, false],
    ['ocean heat', { prefix: false, typos: 0 }, false],
    ['ocean heat', { prefix: false, typos: 0 }, true],
    ['volcano', { prefix: true, typos: 0 }, false],
    ['glacer', { prefix: false, typos: 1 }, false],
    ['thermometr stations', { prefix: true, typos: 1 }, false],
    ['greenhouse effect water vapour', { prefix: true, typos: 1 }, false],
    ['cosmic rays clouds', { prefix: true, typos: 1 }, true],
  ];

  it.each(cases)('ranks “%s” (%o, every word: %s) as MiniSearch does', (query, options, all) => {
    const expected = miniResults(query, options, all);
    const actual = compactResults(query, options, all);
    expect(expected.length).toBeGreaterThan(0);
    expect(actual.map((result) => result.id)).toEqual(expected.map((result) => result.id));
    actual.forEach((result, i) => expect(result.score).toBeCloseTo(expected[i]!.score, 9));
  });

  it('forgets a removed document as MiniSearch does', () => {
    const gone = corpus[7]!;
    const reduced = new MiniSearch<(typeof corpus)[number]>({
      fields: [...fields],
      tokenize: (text) => wordsOf(text),
      processTerm: (term) => term,
    });
    reduced.addAll(corpus.filter((document) => document !== gone));
    const compact = new CompactIndex(fields.length, wordsOf);
    for (const document of corpus) compact.add(fields.map((field) => document[field]));
    compact.remove(
      7,
      fields.map((field) => gone[field]),
    );

    const query = wordsOf(gone.title)[0]!;
    const expected = reduced
      .search(query, { boost: { title: 3, text: 2, claimant: 1.5 } })
      .map(({ id, score }) => ({ id: id as number, score }));
    const actual: Array<{ id: number; score: number }> = [];
    compact.search(
      [[{ derived: compact.derive(query, { prefix: false, typos: 0 }) }]],
      false,
      boosts,
      (slot) => slot !== 7,
      (slot, score) => actual.push({ id: slot, score }),
    );
    expect(actual.map((result) => result.id).sort((a, b) => a - b)).toEqual(
      expected.map((result) => result.id).sort((a, b) => a - b),
    );
    const byId = new Map(expected.map((result) => [result.id, result.score]));
    for (const result of actual) expect(result.score).toBeCloseTo(byId.get(result.id)!, 9);
  });
});

describe('CompactIndex: common words in an any search', () => {
  // 3 000 documents: "the" in all, "warming" in half, and one of 100 rare words in each.
  const rare = (n: number) => `rare${String.fromCharCode(97 + (n % 26))}${Math.floor(n / 26)}`;
  const pick = random(20_261_203);
  const documents = Array.from({ length: 3_000 }, (_, id) => ({
    id,
    text: ['the', pick() < 0.5 ? 'warming' : 'record', rare(Math.floor(pick() * 100))].join(' '),
  }));
  const reference = new MiniSearch<(typeof documents)[number]>({
    fields: ['text'],
    tokenize: (text) => wordsOf(text),
    processTerm: (term) => term,
  });
  reference.addAll(documents);
  const large = new CompactIndex(1, wordsOf);
  for (const document of documents) large.add([document.text]);

  function anySearch(query: string) {
    const found = new Map<number, number>();
    large.search(
      wordsOf(query).map((word) => [{ derived: large.derive(word, { prefix: false, typos: 0 }) }]),
      false,
      [1],
      () => true,
      (slot, score) => found.set(slot, score),
    );
    return found;
  }

  /** MiniSearch's scores for the documents that have one of `finders`: what must be found. */
  function expectedFor(query: string, finders: string[]) {
    return reference
      .search(query, { combineWith: 'OR' })
      .filter((result) =>
        finders.some((word) => wordsOf(documents[result.id]!.text).includes(word)),
      );
  }

  it('finds documents by the rare words and scores them with every word', () => {
    const query = `the warming ${rare(7)} ${rare(8)}`;
    const expected = expectedFor(query, [rare(7), rare(8)]);
    const found = anySearch(query);
    expect(expected.length).toBeGreaterThan(20);
    expect([...found.keys()].sort((a, b) => a - b)).toEqual(
      expected.map((result) => result.id as number).sort((a, b) => a - b),
    );
    for (const result of expected) expect(found.get(result.id)).toBeCloseTo(result.score, 9);
  });

  it('lets the rarest of common words find documents when every word is common', () => {
    // "warming" is in half the documents and "the" in all: "warming" finds, "the" adds.
    const expected = expectedFor('the warming', ['warming']);
    const found = anySearch('the warming');
    // A word the index lacks changes nothing (it was once taken for the rarest).
    expect(anySearch('the warming qqqzzz')).toEqual(found);
    expect(found.size).toBe(expected.length);
    expect(found.size).toBeGreaterThan(1_000);
    for (const result of expected) expect(found.get(result.id)).toBeCloseTo(result.score, 9);
  });
});

describe('CompactIndex: words it learns', () => {
  it('finds a word, and its misspellings, as soon as a document brings it', () => {
    const growing = new CompactIndex(1, wordsOf);
    growing.add(['the harbour wall at marrowby']);
    const typed = { prefix: true, typos: 1 };
    expect(growing.derive('seawal', typed)).toEqual([]);
    growing.add(['the seawall was raised']);
    expect(growing.derive('seawal', typed).map((derived) => derived.term)).toEqual(['seawall']);
    expect(growing.derive('seawal', { prefix: false, typos: 1 })).toHaveLength(1);
  });
});
