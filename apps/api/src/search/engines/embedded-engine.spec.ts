import { claimDocument } from '../../../test/support/search-documents';
import { EmbeddedSearchEngine } from './embedded-engine';

const id = (n: number) => `00000000-0000-4000-8000-${String(n).padStart(12, '0')}`;

describe('the embedded engine’s synonyms', () => {
  // Ten claims with the word itself and one with only its synonym, so the synonym is the
  // rarer word: weighed by its own rarity, it would rank first.
  const withWord = Array.from({ length: 10 }, (_, n) =>
    claimDocument(id(n + 1), {
      title: `Global warming stopped in ${2010 + n}`,
      text: `No warming at all since ${2010 + n}.`,
    }),
  );
  const withSynonym = claimDocument(id(99), {
    title: 'Electric heating stopped in 2016',
    text: 'No heating at all since 2016.',
  });
  const engine = new EmbeddedSearchEngine();

  beforeAll(() => engine.replaceAll([...withWord, withSynonym]));

  it('ranks the word itself above a rarer synonym, and still finds the synonym', async () => {
    const { hits } = await engine.search({
      q: 'warming',
      filters: {},
      offset: 0,
      limit: 20,
      match: 'all',
    });
    const ranked = hits.map((hit) => hit.document.entityId);
    expect(ranked).toHaveLength(11);
    expect(ranked.at(-1)).toBe(withSynonym.entityId);
  });
});
