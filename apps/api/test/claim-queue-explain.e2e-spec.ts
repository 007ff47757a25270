import {
  CLAIM_PAGE_SIZE_DEFAULT,
  claimQueueQuerySchema,
  claimSortFields,
  type ClaimSortField,
  type Role,
} from '@skyledger/contracts';
import { deskDefaults, generateDesk, generatedDesk } from '@skyledger/seeds-demo/generator';
import { type AuthenticatedUser } from '../src/auth/authenticated-user';
import { ClaimsService } from '../src/claims/claims.service';
import { captureQueries, describePlan, explain } from './support/query-plans';
import { createTestApp, type TestApp } from './support/test-app';

const CLAIMS = 100_000;

// The generator is a pure function of its seed, so the people and claimants it writes
// are known here without reading them back (the first claimant and science editor are
// its busiest).
const desk = generatedDesk({ ...deskDefaults, claims: CLAIMS });
const personOf = (role: Role): AuthenticatedUser => {
  const person = desk.people.find((candidate) => candidate.role === role)!;
  return { id: person.id, email: person.email, displayName: person.displayName, role };
};
const editor = personOf('science_editor');
const reporter = personOf('reporter');
const chief = personOf('desk_chief');
const claimant = desk.claimants[0]!;

/** The queue's common filters, as the desk sends them (URL search parameters). */
const filters: Array<{ name: string; actor: AuthenticatedUser; params: Record<string, string> }> = [
  { name: 'no filter', actor: chief, params: {} },
  { name: 'no filter, oldest first', actor: chief, params: { order: 'asc' } },
  { name: 'status', actor: chief, params: { status: 'in_research' } },
  { name: 'mine (science editor)', actor: editor, params: { mine: 'true' } },
  { name: 'mine (reporter)', actor: reporter, params: { mine: 'true' } },
  { name: 'mine and status', actor: editor, params: { mine: 'true', status: 'awaiting_signoff' } },
  { name: 'assignee', actor: chief, params: { assignee: editor.id } },
  { name: 'nobody assigned', actor: chief, params: { assignee: 'none' } },
  { name: 'topic', actor: chief, params: { topic: 'solar' } },
  { name: 'topic and status', actor: chief, params: { topic: 'sea-level', status: 'published' } },
  { name: 'claimant', actor: chief, params: { claimant: claimant.id } },
  {
    name: 'filed between',
    actor: chief,
    params: { filedFrom: '2026-09-01', filedTo: '2026-09-30' },
  },
  { name: 'legal flag', actor: chief, params: { legal: 'true' } },
];
const sorts: Array<ClaimSortField | undefined> = [undefined, ...claimSortFields];

/** Filters whose results run to many pages: they are also read at their last page. */
const paged = new Set([
  'no filter',
  'no filter, oldest first',
  'status',
  'mine (science editor)',
  'nobody assigned',
  'topic',
]);

const cases = filters.flatMap((filter) =>
  sorts.flatMap((sort) =>
    [false, true]
      .filter((late) => !late || paged.has(filter.name))
      .map((late) => ({
        ...filter,
        sort,
        late,
        title: `${filter.name}, sorted by ${sort ?? 'default'}, ${late ? 'last' : 'first'} page`,
      })),
  ),
);

/** The tables the queue reads claims from: a step on them must go through an index. */
const queueTables = new Set(['claims', 'claim_topics']);

describe(`the claim queue at ${CLAIMS} generated claims: every common filter uses an index`, () => {
  let t: TestApp;
  let service: ClaimsService;

  const queue = (actor: AuthenticatedUser, params: Record<string, string>) =>
    service.queue(actor, claimQueueQuerySchema.parse(params));

  beforeAll(async () => {
    // No worker or scheduler: a query of theirs would be counted as the queue's.
    t = await createTestApp('claim-queue-explain', {
      OUTBOX_WORKER_ENABLED: 'false',
      PUBLISHER_ENABLED: 'false',
    });
    service = t.app.get(ClaimsService);
    const { written, seconds } = await generateDesk(t.dataSource, { claims: CLAIMS });
    expect(written.Claim).toBe(CLAIMS);
    console.info(`Generated ${CLAIMS} claims in ${seconds.toFixed(1)} s`);
    // Fresh statistics, as a live database would have, so the plans are the real ones.
    await t.dataSource.query('ANALYZE TABLE claims, claim_topics, claim_sources, claimants, users');
  }, 180_000);
  afterAll(() => t?.close());

  it.each(cases)('$title', async ({ actor, params, sort, late }) => {
    const query = { ...params, ...(sort ? { sort } : {}) };
    let page = 1;
    if (late) {
      const { total } = await queue(actor, query);
      page = Math.ceil(total / CLAIM_PAGE_SIZE_DEFAULT);
      expect(page).toBeGreaterThan(10);
    }

    const { result, queries } = await captureQueries(t.dataSource, () =>
      queue(actor, { ...query, page: String(page) }),
    );
    // A filter that matched nothing would prove nothing about its plan.
    expect(result.items.length).toBeGreaterThan(0);
    // The page, and the counts per status unless the same filters were counted a moment
    // ago (claim-status-counts.ts): each filter's first case counts, so every plan is seen.
    expect([1, 2]).toContain(queries.length);

    for (const query of queries) {
      const plan = await explain(t.dataSource, query);
      const steps = plan.filter((step) => queueTables.has(step.table));
      expect(steps.length).toBeGreaterThan(0);
      const scans = steps.filter((step) => step.type === 'ALL' || step.key === null);
      expect(
        scans.length === 0
          ? 'no full scan'
          : `${query.sql}\n${JSON.stringify(query.parameters)}\n${describePlan(plan)}`,
      ).toBe('no full scan');
    }
  });

  it('gives generated people no password, so nobody can sign in as them', async () => {
    for (const person of [editor, reporter, chief]) {
      const response = await t
        .http()
        .post('/api/auth/sign-in')
        .send({ email: person.email, password: 'skyledger-demo' });
      expect(response.status).toBe(401);
    }
  });

  it('refuses a database that holds claims unless appending, and a seed already used', async () => {
    await expect(generateDesk(t.dataSource, { claims: 10 })).rejects.toThrow(/--append/);
    await expect(generateDesk(t.dataSource, { claims: 10, append: true })).rejects.toThrow(
      /another --seed/,
    );
    const appended = await generateDesk(t.dataSource, { claims: 10, append: true, seed: 2 });
    // The generated desk is matched by e-mail and reused; only the new claims' rows are added.
    expect(appended.written).toMatchObject({ User: 0, Claimant: 10, Claim: 10 });
  });
});
