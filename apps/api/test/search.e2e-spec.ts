import {
  roles,
  type ClaimDetail,
  type Highlight,
  type Role,
  type SearchResponse,
  type SimilarClaim,
} from '@skyledger/contracts';
import { DeskFlow } from './support/desk-flow';
import { FakeMeilisearch } from './support/fake-meilisearch';
import { createTestApp, testPassword, type TestApp } from './support/test-app';

const appearance = {
  url: 'https://thelongweather.test/posts/2016',
  outlet: 'The Long Weather newsletter',
  seenAt: '2026-11-19T07:05:00+00:00',
  seenTimeZone: 'Europe/London',
};

/** The words a highlight marks as matched, lower-cased. */
const marked = (runs: Highlight | null) =>
  (runs ?? []).filter((run) => run.match).map((run) => run.text.toLowerCase());

describe.each([
  ['the embedded engine', async () => ({ env: {}, stop: async () => {} })],
  [
    'Meilisearch (a local fake of its HTTP API)',
    async () => {
      const fake = await new FakeMeilisearch().start();
      return {
        env: { SEARCH_ENGINE: 'meilisearch', MEILI_HOST: fake.host, MEILI_INDEX: 'desk_e2e' },
        stop: () => fake.stop(),
      };
    },
  ],
])('desk search and similar claims on %s', (engineName, engine) => {
  let t: TestApp;
  let stopEngine: () => Promise<unknown>;
  const tokens: Partial<Record<Role, string>> = {};
  const as = (role: Role) => ({ Authorization: `Bearer ${tokens[role]}` });
  let stopped: ClaimDetail;
  let paused: ClaimDetail;

  const search = async (params: Record<string, string>, role: Role = 'reporter') => {
    const response = await t.http().get('/api/search').query(params).set(as(role));
    expect(response.status).toBe(200);
    return response.body as SearchResponse;
  };
  const similarTo = async (text: string) => {
    const response = await t.http().get('/api/claims/similar').query({ text }).set(as('reporter'));
    expect(response.status).toBe(200);
    return response.body as SimilarClaim[];
  };
  const found = async (params: Record<string, string>) =>
    (await search(params)).items.map((item) => item.id);
  const file = async (summary: string, text: string, topics: string[], claimant: string) => {
    const response = await t
      .http()
      .post('/api/claims')
      .set(as('reporter'))
      .send({
        text,
        summary,
        topics,
        claimant: { name: claimant, kind: 'public_figure' },
        firstAppearance: appearance,
      });
    expect(response.status).toBe(201);
    return response.body as ClaimDetail;
  };

  beforeAll(async () => {
    const started = await engine();
    stopEngine = started.stop;
    t = await createTestApp(`search_${engineName.startsWith('the') ? 'embedded' : 'meili'}`, {
      ...started.env,
    });
    for (const role of roles) {
      const user = await t.addUser(role, `${role.replace('_', '-')}@search.test`);
      tokens[role] = (await t.signIn(user.email, testPassword)).accessToken;
    }
    stopped = await file(
      'Global warming stopped in 2016',
      'Warming stopped in 2016. Nine years, no new record worth the name.',
      ['temperature-record'],
      'Rufus Kettleby',
    );
    paused = await file(
      'Warming has paused since 2016, says a reshared clip',
      'The warming paused back in 2016; there has not been a proper record since.',
      ['temperature-record'],
      'Rufus Kettleby',
    );
    await file(
      'Volcanoes emit more CO2 than all human activity',
      'One eruption puts out more carbon dioxide than every car on Earth.',
      ['co2'],
      'Wenlow Energy Forum',
    );
  });
  afterAll(async () => {
    await t.close();
    await stopEngine();
  });

  it('finds a claim as soon as it is filed, best match first, words highlighted', async () => {
    const result = await search({ q: 'global warming stopped' });
    expect(result.items[0]).toMatchObject({ type: 'claim', id: stopped.id, status: 'filed' });
    expect(marked(result.items[0]!.title)).toEqual(['global', 'warming', 'stopped']);
    expect(result.total).toBe(result.items.length);
    expect(result.facets.type).toEqual({ claim: result.total });
  });

  it('forgives a one-letter typo and matches word beginnings', async () => {
    expect(await found({ q: 'volcanos' })).toHaveLength(1);
    expect(await found({ q: 'Kettleb' })).toEqual(expect.arrayContaining([stopped.id, paused.id]));
  });

  it('filters by kind, status, topic and filing date, with facet counts', async () => {
    const both = await search({ q: '2016', topic: 'temperature-record' });
    expect(both.items.map((item) => item.id).sort()).toEqual([stopped.id, paused.id].sort());
    expect(both.facets.topics).toEqual({ 'temperature-record': 2 });
    expect(await found({ q: '2016', type: 'source' })).toEqual([]);
    expect(await found({ q: '2016', from: '2000-01-01', to: '2001-01-01' })).toEqual([]);
    const today = new Date().toISOString().slice(0, 10);
    expect(await found({ q: '2016', from: today, to: today })).toHaveLength(2);
  });

  it('keeps the index in step with set-asides, claimant renames and sources', async () => {
    const chief = as('desk_chief');
    const setAside = await t.http().post(`/api/claims/${paused.id}/transitions`).set(chief).send({
      to: 'set_aside',
      reason: 'duplicate',
      note: 'Same as the 2016 claim',
      version: paused.version,
    });
    expect(setAside.status).toBe(200);
    expect(await found({ q: '2016', status: 'set_aside' })).toEqual([paused.id]);
    expect(await found({ q: '2016', status: 'filed' })).toEqual([stopped.id]);

    const renamed = await t
      .http()
      .patch(`/api/claimants/${stopped.claimant.id}`)
      .set(chief)
      .send({ name: 'Rufus Kettleby-Marsh', version: stopped.claimant.version });
    expect(renamed.status).toBe(200);
    // Each claim was filed with a claimant of its own: only the renamed one's claim moves.
    expect(await found({ q: 'Kettleby-Marsh warming' })).toEqual([stopped.id]);

    const linked = await t
      .http()
      .post(`/api/claims/${stopped.id}/sources`)
      .set(as('science_editor'))
      .send({
        source: {
          // Invented for the test.
          title: 'Upper-air temperatures over Wenlow from radiosonde ascents',
          publisher: 'Wenlow Regional Climate Service',
          year: 2025,
          url: 'https://wenlow-climate.test/radiosonde',
          kind: 'agency_dataset',
          grade: 'strong',
          gradeReason: 'The agency’s own quality-controlled series',
        },
      });
    expect(linked.status).toBe(201);
    const sources = await search({ q: 'radiosonde', type: 'source' });
    expect(sources.items).toHaveLength(1);
    expect(sources.items[0]).toMatchObject({ type: 'source', status: null });
  });

  it('shows earlier phrasings of a recurring claim while a new one is typed', async () => {
    const similar = await similarTo('Since 2016 the warming has stopped: no new global record');
    expect(
      similar
        .slice(0, 2)
        .map((claim) => claim.id)
        .sort(),
    ).toEqual([stopped.id, paused.id].sort());
    expect(similar.find((claim) => claim.id === paused.id)).toMatchObject({
      status: 'set_aside',
      summary: 'Warming has paused since 2016, says a reshared clip',
      // Never published: no rating, no explainer.
      rating: null,
      explainerUrl: null,
    });
  });

  it('refuses bad queries with the field named, and strangers', async () => {
    const empty = await t.http().get('/api/search').set(as('reporter'));
    expect(empty.status).toBe(400);
    expect(Object.keys(empty.body.fields)).toContain('q');
    const badType = await t
      .http()
      .get('/api/search')
      .query({ q: 'x', type: 'memo' })
      .set(as('reporter'));
    expect(badType.status).toBe(400);
    expect(Object.keys(badType.body.fields)).toEqual(['type']);
    const short = await t
      .http()
      .get('/api/claims/similar')
      .query({ text: 'too short' })
      .set(as('reporter'));
    expect(short.status).toBe(400);
    expect(Object.keys(short.body.fields)).toEqual(['text']);
    expect((await t.http().get('/api/search').query({ q: 'warming' })).status).toBe(401);
  });

  it('lets a desk chief, and nobody else, rebuild the index', async () => {
    const refused = await t.http().post('/api/search/reindex').set(as('science_editor'));
    expect(refused.status).toBe(403);
    const rebuilt = await t.http().post('/api/search/reindex').set(as('desk_chief'));
    expect(rebuilt.status).toBe(200);
    // Three claims and one source.
    expect(rebuilt.body).toMatchObject({ documents: 4 });
    expect(await found({ q: 'global warming stopped' })).toContain(stopped.id);
  });

  it('gives a published similar claim its rating and the address of its explainer', async () => {
    const desk = await DeskFlow.start(t, 'published.search.test');
    const core = await desk.clearedClaim('Heat from the Earth’s core is warming the planet');
    const slug = await desk.publishNow(core.id);
    const similar = await similarTo('The planet is warming because of heat from the core');
    expect(similar[0]).toMatchObject({
      id: core.id,
      status: 'published',
      rating: 'contradicted',
      explainerUrl: expect.stringMatching(new RegExp(`/explainers/${slug}$`)),
    });
  });
});
