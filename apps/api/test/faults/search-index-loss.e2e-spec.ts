import { type SearchResponse } from '@skyledger/contracts';
import { SearchEngine } from '../../src/search/search-engine';
import { DeskFlow } from '../support/desk-flow';
import { createTestApp, type TestApp } from '../support/test-app';

/** The search index is a copy: lose it, and a rebuild from MariaDB gives the same answers. */
describe('the search index is discarded', () => {
  let t: TestApp;
  let desk: DeskFlow;

  beforeAll(async () => {
    t = await createTestApp('search_index_loss', {
      OUTBOX_WORKER_ENABLED: 'false',
      PUBLISHER_ENABLED: 'false',
    });
    desk = await DeskFlow.start(t, 'index-loss.test');
    const claim = await desk.clearedClaim('The seabed heats the North Sea, a caller said');
    await desk.publishNow(claim.id);
    for (const summary of [
      'Volcanoes outpace cars on CO2',
      'The sun is brighter than ever',
      'Warming stopped in 2016',
    ]) {
      await t
        .http()
        .post('/api/claims')
        .set(desk.as('reporter'))
        .send({
          text: `${summary}, someone said.`,
          summary,
          topics: ['faults'],
          claimant: { name: 'A caller', kind: 'organisation' },
        })
        .expect(201);
    }
  });
  afterAll(() => t.close());

  const queries = ['heat', 'volcanos', 'sun brighter', 'warming 2016', 'Pollack', 'caller'];
  const answers = async () => {
    const results: Record<string, unknown> = {};
    for (const q of queries) {
      const response = await t
        .http()
        .get('/api/search')
        .query({ q })
        .set(desk.as('reporter'))
        .expect(200);
      const body = response.body as SearchResponse;
      results[q] = {
        total: body.total,
        items: body.items.map((item) => [item.type, item.id, item.title]),
        facets: body.facets,
      };
    }
    return results;
  };

  it('finds nothing once the index is gone, and the same as before after the rebuild', async () => {
    const before = await answers();
    expect(Object.values(before).every((result) => (result as { total: number }).total > 0)).toBe(
      true,
    );

    await t.app.get(SearchEngine).replaceAll([]);
    const lost = await answers();
    expect(Object.values(lost).every((result) => (result as { total: number }).total === 0)).toBe(
      true,
    );

    const rebuilt = await t.http().post('/api/search/reindex').set(desk.as('chief')).expect(200);
    expect(rebuilt.body.documents).toBeGreaterThanOrEqual(6);
    expect(await answers()).toEqual(before);
  });
});
