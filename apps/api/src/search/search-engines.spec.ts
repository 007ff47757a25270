import { FakeMeilisearch } from '../../test/support/fake-meilisearch';
import { claimDocument } from '../../test/support/search-documents';
import { EmbeddedSearchEngine } from './engines/embedded-engine';
import { MeilisearchEngine, meilisearchSettings } from './engines/meilisearch-engine';
import { documentId, type SearchDocument } from './search-document';
import { type EngineQuery, type SearchEngine } from './search-engine';

const day = (iso: string) => Date.parse(`${iso}T00:00:00Z`);

const claim = claimDocument;

const ids = {
  core: '00000000-0000-4000-8000-000000000001',
  sun: '00000000-0000-4000-8000-000000000002',
  pause: '00000000-0000-4000-8000-000000000003',
  pauseAgain: '00000000-0000-4000-8000-000000000004',
  volcano: '00000000-0000-4000-8000-000000000005',
  source: '00000000-0000-4000-8000-000000000006',
  explainer: '00000000-0000-4000-8000-000000000007',
};

const documents: SearchDocument[] = [
  claim(ids.core, {
    title: 'Earth’s core, not greenhouse gases, is warming the planet',
    text: 'The heat coming up from the Earth’s core is what is warming the planet.',
    topicList: ['geothermal'],
    claimant: 'Councillor Aldous Threlkeld',
  }),
  claim(ids.sun, {
    title: 'The sun has grown brighter, and that explains recent warming',
    text: 'Satellites show the sun is brighter than ever, which is why it is hotter.',
    topicList: ['solar'],
    status: 'filed',
    date: day('2026-11-20'),
  }),
  claim(ids.pause, {
    title: 'Global warming stopped in 2016',
    text: 'There has been no global warming at all since 2016.',
    topicList: ['temperature-trend'],
    status: 'published',
    rating: 'contradicted',
    date: day('2026-05-02'),
  }),
  claim(ids.pauseAgain, {
    title: 'Warming has paused since 2016, says a podcast clip',
    text: 'Temperatures have gone flat since the 2016 peak; the warming has paused.',
    topicList: ['temperature-trend'],
    status: 'set_aside',
    date: day('2026-10-12'),
  }),
  claim(ids.volcano, {
    title: 'Volcanoes emit more CO2 than all human activity',
    text: 'One eruption puts out more carbon dioxide than every car on Earth.',
    topicList: ['co2', 'volcanoes'],
  }),
  {
    ...claim(ids.source, { title: 'Global volcanic CO2 emissions estimated', text: '' }),
    id: documentId('source', ids.source),
    type: 'source',
    claimant: '',
    authors: 'Fischer, T. P.; Aiuppa, A.',
    publisher: 'Geochemistry, Geophysics, Geosystems',
    status: null,
  },
  {
    ...claim(ids.explainer, {
      title: 'No, warming did not stop in 2016',
      text: 'Every year since 2016 has been among the warmest on record.',
      body: 'The trend since 1979 is about 0.2 °C per decade; short windows mislead.',
      status: 'published',
      rating: 'contradicted',
    }),
    id: documentId('explainer', ids.explainer),
    type: 'explainer',
    audience: 'public',
  },
];

const query = (q: string, extra: Partial<EngineQuery> = {}): EngineQuery => ({
  q,
  filters: {},
  offset: 0,
  limit: 20,
  match: 'all',
  ...extra,
});

const meiliHost = process.env.MEILI_TEST_HOST;

describe.each([
  [
    'the embedded engine',
    () =>
      Promise.resolve({ engine: new EmbeddedSearchEngine() as SearchEngine, stop: async () => {} }),
  ],
  [
    meiliHost ? `Meilisearch at ${meiliHost}` : 'the Meilisearch engine (against a local fake)',
    async () => {
      const fake = meiliHost ? null : await new FakeMeilisearch().start();
      const engine = new MeilisearchEngine({
        host: meiliHost ?? fake!.host,
        apiKey: process.env.MEILI_TEST_API_KEY,
        index: `skyledger_engine_spec_${process.pid}`,
      });
      return { engine: engine as SearchEngine, stop: async () => fake?.stop() };
    },
  ],
])('%s', (_name, open) => {
  let engine: SearchEngine;
  let stop: () => Promise<unknown>;
  const entityIds = async (q: string, extra: Partial<EngineQuery> = {}) =>
    (await engine.search(query(q, extra))).hits.map((hit) => hit.document.entityId);

  beforeAll(async () => {
    ({ engine, stop } = await open());
    await engine.start();
    await engine.replaceAll(documents);
  });
  afterAll(() => stop());

  it('counts what it holds', async () => {
    expect(await engine.count()).toBe(documents.length);
  });

  it('ranks the document whose summary matches exactly first', async () => {
    expect((await entityIds('Global warming stopped in 2016'))[0]).toBe(ids.pause);
    expect((await entityIds('volcanoes emit'))[0]).toBe(ids.volcano);
  });

  it('still finds a claim with a one-letter typo', async () => {
    expect(await entityIds('volcanos')).toContain(ids.volcano);
    expect(await entityIds('brightr sun')).toContain(ids.sun);
  });

  it('matches the start of a word as it is typed', async () => {
    expect(await entityIds('geother')).toContain(ids.core);
    expect(await entityIds('volc')).toEqual(expect.arrayContaining([ids.volcano, ids.source]));
  });

  it('matches only the last word as a prefix: the words before it are whole', async () => {
    expect(await entityIds('heat geother')).toEqual([ids.core]);
    expect(await entityIds('geother heat')).toEqual([]);
  });

  it('searches claimants, topics and source authors too', async () => {
    expect(await entityIds('Threlkeld')).toEqual([ids.core]);
    expect(await entityIds('Aiuppa')).toEqual([ids.source]);
  });

  it('treats the desk’s synonyms alike', async () => {
    expect(await entityIds('solar brighter')).toContain(ids.sun);
  });

  it('filters by kind, status, topic, rating, date range and audience', async () => {
    expect(await entityIds('volcanic', { filters: { types: ['source'] } })).toEqual([ids.source]);
    expect(await entityIds('2016', { filters: { status: 'set_aside' } })).toEqual([ids.pauseAgain]);
    expect(
      (await entityIds('warming', { filters: { topic: 'temperature-trend' } })).sort(),
    ).toEqual([ids.pause, ids.pauseAgain].sort());
    expect((await entityIds('2016', { filters: { rating: 'contradicted' } })).sort()).toEqual(
      [ids.pause, ids.explainer].sort(),
    );
    expect(
      await entityIds('warming', {
        filters: { types: ['claim'], from: day('2026-10-01'), before: day('2026-11-15') },
      }),
    ).toEqual(expect.arrayContaining([ids.pauseAgain, ids.core]));
    expect(
      await entityIds('warming', {
        filters: { types: ['claim'], from: day('2026-10-01'), before: day('2026-11-15') },
      }),
    ).not.toContain(ids.sun);
    expect(await entityIds('2016', { filters: { audience: 'public' } })).toEqual([ids.explainer]);
  });

  it('counts facets over every match, not just the page', async () => {
    const result = await engine.search(query('warming', { limit: 1 }));
    expect(result.hits).toHaveLength(1);
    expect(result.total).toBeGreaterThanOrEqual(4);
    expect(result.facets.type).toMatchObject({ claim: expect.any(Number), explainer: 1 });
    expect(result.facets.topics['temperature-trend']).toBe(2);
  });

  it('reports which words matched in which field, for highlighting', async () => {
    const [hit] = (await engine.search(query('volcanoes'))).hits;
    expect(hit?.document.entityId).toBe(ids.volcano);
    expect(hit?.matchedTerms.title).toContain('volcanoes');
  });

  it('needs every word on the search page, any word for similar claims', async () => {
    expect(await entityIds('volcanoes geothermal')).toEqual([]);
    expect(await entityIds('volcanoes geothermal', { match: 'any' })).toEqual(
      expect.arrayContaining([ids.volcano, ids.core]),
    );
    // Similar claims show no facets, so none are counted for them.
    expect((await engine.search(query('volcanoes', { match: 'any' }))).facets).toEqual({
      type: {},
      status: {},
      topics: {},
    });
  });

  it('makes a write searchable at once, and forgets what is removed', async () => {
    const fresh = '00000000-0000-4000-8000-000000000099';
    await engine.upsert([
      claim(fresh, {
        title: 'Tidal gauges at Marrowby were moved to fake a rise',
        text: 'The harbour gauge was moved.',
      }),
    ]);
    expect(await entityIds('tidal gauges')).toEqual([fresh]);
    await engine.upsert([
      claim(fresh, {
        title: 'Tidal gauges at Marrowby were moved to fake a rise',
        text: 'The harbour gauge was moved.',
        status: 'set_aside',
      }),
    ]);
    expect(await entityIds('tidal', { filters: { status: 'set_aside' } })).toEqual([fresh]);
    await engine.remove([documentId('claim', fresh)]);
    expect(await entityIds('tidal gauges')).toEqual([]);
    expect(await engine.count()).toBe(documents.length);
  });
});

describe('the Meilisearch engine and the server it talks to', () => {
  let fake: FakeMeilisearch;
  beforeAll(async () => {
    fake = await new FakeMeilisearch().start();
  });
  afterAll(() => fake.stop());

  it('creates its index once and applies the settings declared in code at every start', async () => {
    const options = { host: fake.host, index: 'skyledger_settings' };
    await new MeilisearchEngine(options).start();
    await new MeilisearchEngine(options).start();
    expect(fake.requests.filter((request) => request === 'POST /indexes')).toHaveLength(1);
    expect(fake.settingsOf('skyledger_settings')).toMatchObject(meilisearchSettings);
  });

  it('rebuilds in a second index and swaps it in, never emptying the one searched', async () => {
    const engine = new MeilisearchEngine({ host: fake.host, index: 'skyledger_swap' });
    await engine.start();
    const [old, renewed] = documents;
    await engine.upsert([old!]);
    await engine.replaceAll([renewed!]);

    const found = await engine.search(query('brighter'));
    expect(found.hits.map((hit) => hit.document.id)).toEqual([renewed!.id]);
    expect(await engine.count()).toBe(1);
    expect(fake.requests).toContain('POST /swap-indexes');
    expect(fake.requests).not.toContain('DELETE /indexes/skyledger_swap/documents');
    expect(fake.settingsOf('skyledger_swap')).toMatchObject(meilisearchSettings);
    expect(fake.settingsOf('skyledger_swap_rebuild')).toBeUndefined();
  });

  it('makes a task the server could not carry out an error, not silence', async () => {
    // Never started, so its index does not exist: the deletion is accepted, then fails.
    const engine = new MeilisearchEngine({ host: fake.host, index: 'skyledger_missing' });
    await expect(engine.remove([documentId('claim', ids.core)])).rejects.toThrow(
      /Meilisearch task \d+ \(documentDeletion\) failed: Index `skyledger_missing` not found/,
    );
  });
});
