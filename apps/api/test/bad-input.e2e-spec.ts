import { tableFingerprints } from '@skyledger/devstack/backup';
import { type ClaimDetail, type VerdictVersionView } from '@skyledger/contracts';
import fc from 'fast-check';
import { DeskFlow, type Person } from './support/desk-flow';
import { createTestApp, type TestApp } from './support/test-app';

/** One request the desk can make, with a valid body the generators break. */
interface Target {
  method: 'post' | 'patch' | 'put';
  path: string;
  as: Person;
  body: Record<string, unknown>;
}

/** Query strings of the list and search routes, each broken by the generators too. */
interface QueryTarget {
  path: string;
  as: Person;
  query: Record<string, string>;
  /** Parameters with a type or a set of values (the rest are free text). */
  typed: string[];
}

const seed = Number(process.env.FC_SEED ?? 20261202);
const REQUESTS = Number(process.env.BAD_INPUT_REQUESTS ?? 10_000);

const unicodeEdges = [
  '\u0000',
  '\uD800',
  '\uDFFF',
  '\u202E',
  '\u200B\u200D',
  '\uFEFF',
  '𝕏'.repeat(3),
  'e\u0301\u0301\u0301',
  '\u{1F9EA}',
];

/** A value of another JSON type than `value`, so the field is surely wrong. */
const wrongTypeFor = (value: unknown): fc.Arbitrary<unknown> => {
  const kinds: Array<fc.Arbitrary<unknown>> = [];
  if (typeof value !== 'string')
    kinds.push(fc.string(), fc.constantFrom(...unicodeEdges), fc.constant('not-a-uuid'));
  if (typeof value !== 'number')
    kinds.push(
      fc.oneof(fc.integer({ min: -2_147_483_648, max: -1 }), fc.constant(1e308), fc.constant(-0.5)),
    );
  if (typeof value !== 'boolean') kinds.push(fc.boolean());
  if (!Array.isArray(value)) kinds.push(fc.array(fc.jsonValue(), { maxLength: 4 }));
  if (typeof value !== 'object' || value === null || Array.isArray(value)) {
    kinds.push(fc.dictionary(fc.string({ maxLength: 6 }), fc.jsonValue(), { maxKeys: 3 }));
  }
  return fc.oneof(...kinds);
};

/**
 * Breaks a valid body so that it is invalid for sure: an unknown field, a field of the
 * wrong type, a string far over any limit, a required field missing, or no object at all.
 */
function brokenBody(body: Record<string, unknown>): fc.Arbitrary<unknown> {
  const fields = Object.keys(body);
  const strings = fields.filter((field) => typeof body[field] === 'string');
  const breakers: Array<fc.Arbitrary<unknown>> = [
    fc
      .tuple(
        fc.string({ minLength: 1, maxLength: 12 }),
        fc.oneof(fc.jsonValue(), fc.constantFrom(...unicodeEdges)),
      )
      .map(([key, value]) => ({ ...body, [`x_${key}`]: value })),
    fc
      .constantFrom(...fields)
      .chain((field) => wrongTypeFor(body[field]).map((value) => ({ ...body, [field]: value }))),
    fc.oneof(
      fc.array(fc.jsonValue(), { maxLength: 3 }),
      fc.string(),
      fc.integer(),
      fc.constant(null),
    ),
  ];
  if (strings.length) {
    breakers.push(
      fc
        .tuple(fc.constantFrom(...strings), fc.integer({ min: 10_001, max: 60_000 }))
        .map(([field, length]) => ({
          ...body,
          [field]: `${unicodeEdges[length % unicodeEdges.length]}${'x'.repeat(length)}`,
        })),
    );
  }
  if ('version' in body) breakers.push(fc.constant({ ...body, version: -1 }));
  return fc.oneof(...breakers);
}

/** Breaks a query: a typed parameter given junk, any parameter far too long, or an unknown one. */
function brokenQuery(target: QueryTarget): fc.Arbitrary<Record<string, string>> {
  const { query, typed } = target;
  const breakers: Array<fc.Arbitrary<Record<string, string>>> = [
    fc.string({ minLength: 1, maxLength: 8 }).map((key) => ({ ...query, [`x_${key}`]: '1' })),
    fc
      .tuple(fc.constantFrom(...Object.keys(query)), fc.integer({ min: 5_000, max: 9_000 }))
      .map(([field, length]) => ({ ...query, [field]: 'q'.repeat(length) })),
  ];
  if (typed.length) {
    breakers.push(
      fc
        .tuple(
          fc.constantFrom(...typed),
          fc.constantFrom('-1', '1e400', '2026-02-30', 'not-a-uuid', '\u0000', 'NaN'),
        )
        .map(([field, value]) => ({ ...query, [field]: value })),
    );
  }
  return fc.oneof(...breakers);
}

describe('generated bad input against every request body and query', () => {
  let t: TestApp;
  let desk: DeskFlow;
  const targets: Target[] = [];
  const queries: QueryTarget[] = [];

  beforeAll(async () => {
    t = await createTestApp('bad_input', {
      OUTBOX_WORKER_ENABLED: 'false',
      PUBLISHER_ENABLED: 'false',
      AUTH_RATE_LIMIT_PER_MINUTE: '100000',
    });
    desk = await DeskFlow.start(t, 'bad-input.test');
    const claim = await desk.clearedClaim('Bad input changes nothing on the desk');
    const detail = (await desk.detail(claim.id)) as ClaimDetail;
    const [appearance] = detail.appearances;
    const [source] = detail.sources;
    const verdict = (await t.http().get(`/api/claims/${claim.id}/verdict`).set(desk.as('copy')))
      .body.versions[0] as VerdictVersionView;
    const c = `/api/claims/${claim.id}`;
    const v = detail.version;
    targets.push(
      {
        method: 'post',
        path: '/api/claims',
        as: 'reporter',
        body: {
          text: 'A claim as said.',
          summary: 'A claim',
          topics: ['solar'],
          claimant: { name: 'Someone', kind: 'organisation' },
        },
      },
      { method: 'patch', path: c, as: 'editor', body: { summary: 'Changed', version: v } },
      {
        method: 'post',
        path: `${c}/assign`,
        as: 'chief',
        body: { assigneeId: desk.ids.editor, version: v },
      },
      {
        method: 'post',
        path: `${c}/transitions`,
        as: 'chief',
        body: { to: 'set_aside', reason: 'duplicate', note: 'x', version: v },
      },
      {
        method: 'post',
        path: `${c}/appearances`,
        as: 'reporter',
        body: {
          url: 'https://a.test/x',
          outlet: 'A',
          seenAt: '2026-11-30T10:00:00Z',
          seenTimeZone: 'UTC',
        },
      },
      {
        method: 'patch',
        path: `${c}/appearances/${appearance!.id}`,
        as: 'editor',
        body: { outlet: 'B', version: appearance!.version },
      },
      { method: 'post', path: `${c}/sources`, as: 'editor', body: { sourceId: source!.id } },
      {
        method: 'patch',
        path: `/api/sources/${source!.id}`,
        as: 'editor',
        body: { grade: 'weak', gradeReason: 'x', version: source!.version },
      },
      {
        method: 'post',
        path: `${c}/reply-attempts`,
        as: 'editor',
        body: {
          contacted: 'X',
          contactedAt: '2026-11-30T10:00:00Z',
          channel: 'email',
          outcome: 'awaiting',
        },
      },
      {
        method: 'post',
        path: `${c}/consultations`,
        as: 'editor',
        body: {
          name: 'Dr X',
          affiliation: 'Y',
          field: 'Z',
          quote: 'Q',
          consultedOn: '2026-11-30',
          declaredConflicts: 'None',
          independentOfClaimant: true,
        },
      },
      { method: 'post', path: `${c}/comments`, as: 'reporter', body: { body: 'A note' } },
      {
        method: 'post',
        path: `${c}/workings`,
        as: 'editor',
        body: { calculatorId: 'energy-balance', inputs: {} },
      },
      {
        method: 'patch',
        path: `${c}/verdict/versions/${verdict.id}`,
        as: 'editor',
        body: { bottomLine: 'x', version: verdict.version },
      },
      { method: 'post', path: `${c}/publish`, as: 'copy', body: { version: v } },
      { method: 'put', path: `${c}/reply-waiver`, as: 'chief', body: { reason: 'x', version: v } },
      {
        method: 'post',
        path: '/api/claimants',
        as: 'reporter',
        body: { name: 'N', kind: 'organisation' },
      },
      {
        method: 'patch',
        path: `/api/claimants/${detail.claimant.id}`,
        as: 'chief',
        body: { name: 'N', version: detail.claimant.version },
      },
      {
        method: 'post',
        path: '/api/users/invitations',
        as: 'chief',
        body: { email: 'new@bad-input.test', displayName: 'New', role: 'reporter' },
      },
      {
        method: 'patch',
        path: `/api/users/${desk.ids.reporter}`,
        as: 'chief',
        body: { role: 'copy_desk', version: 1 },
      },
      {
        method: 'post',
        path: '/api/rating-levels',
        as: 'chief',
        body: { id: 'new-level', number: null, label: 'L', description: 'D', isRating: false },
      },
      {
        method: 'patch',
        path: '/api/rating-levels/stretched',
        as: 'chief',
        body: { label: 'L', version: 1 },
      },
      {
        method: 'post',
        path: '/api/datasets',
        as: 'editor',
        body: {
          attachmentId: claim.id,
          name: 'N',
          description: 'D',
          timeColumn: 't',
          valueColumns: [{ column: 'v', unit: 'K' }],
        },
      },
      {
        method: 'put',
        path: '/api/me/notifications',
        as: 'editor',
        body: { disabled: ['published'] },
      },
      {
        method: 'post',
        path: '/api/calculators/energy-balance/run',
        as: 'reporter',
        body: { inputs: {} },
      },
      {
        method: 'post',
        path: '/api/auth/sign-in',
        as: 'reporter',
        body: { email: 'reporter@bad-input.test', password: 'wrong password here' },
      },
      {
        method: 'post',
        path: '/api/auth/password-reset/request',
        as: 'reporter',
        body: { email: 'reporter@bad-input.test' },
      },
    );
    queries.push(
      {
        path: '/api/claims',
        as: 'reporter',
        query: {
          status: 'filed',
          sort: 'filedAt',
          order: 'desc',
          page: '1',
          pageSize: '25',
          filedFrom: '2026-01-01',
        },
        typed: ['status', 'sort', 'order', 'page', 'pageSize', 'filedFrom'],
      },
      {
        path: '/api/search',
        as: 'reporter',
        query: { q: 'core', type: 'claim', page: '1', from: '2026-01-01' },
        typed: ['type', 'page', 'from'],
      },
      {
        path: '/api/claims/similar',
        as: 'reporter',
        query: { text: 'the core heats the planet' },
        typed: [],
      },
      {
        path: '/api/audit',
        as: 'chief',
        query: { action: 'claim.published', page: '1', from: '2026-01-01' },
        typed: ['page', 'from'],
      },
      {
        path: '/api/outbox',
        as: 'chief',
        query: { state: 'sent', page: '1' },
        typed: ['state', 'page'],
      },
      { path: '/api/claimants', as: 'reporter', query: { q: 'Some' }, typed: [] },
      { path: '/api/sources', as: 'reporter', query: { q: 'Heat' }, typed: [] },
      { path: '/api/users', as: 'chief', query: { sort: 'name' }, typed: ['sort'] },
    );
  });
  afterAll(() => t.close());

  it(`answers ${REQUESTS} broken requests with a 4xx in the one error shape, and changes nothing`, async () => {
    const access = {
      DB_HOST: process.env.DB_HOST!,
      DB_PORT: process.env.DB_PORT!,
      DB_USER: process.env.DB_USER!,
      DB_PASSWORD: process.env.DB_PASSWORD!,
    };
    const before = await tableFingerprints(access, process.env.DB_NAME!);
    const outcomes = new Map<number, number>();
    const send = (method: Target['method'], path: string) => t.http()[method](path);
    const problems: string[] = [];
    const request = fc.oneof(
      {
        weight: 4,
        arbitrary: fc
          .constantFrom(...targets)
          .chain((target) =>
            brokenBody(target.body).map((body) => ({ kind: 'body' as const, target, body })),
          ),
      },
      {
        weight: 1,
        arbitrary: fc
          .constantFrom(...queries)
          .chain((target) =>
            brokenQuery(target).map((query) => ({ kind: 'query' as const, target, query })),
          ),
      },
    );
    // Four streams of requests at once (seeds apart), to keep the suite's time down.
    const streams = 4;
    const property = fc.asyncProperty(request, async (sample) => {
      const response =
        sample.kind === 'body'
          ? await send(sample.target.method, sample.target.path)
              .set(desk.as(sample.target.as))
              .set('Content-Type', 'application/json')
              // Serialised here: the HTTP client refuses a bare number or boolean.
              .send(JSON.stringify(sample.body) ?? 'null')
          : await t
              .http()
              .get(sample.target.path)
              .set(desk.as(sample.target.as))
              .query(sample.query);
      outcomes.set(response.status, (outcomes.get(response.status) ?? 0) + 1);
      const shaped =
        typeof response.body?.statusCode === 'number' &&
        typeof response.body?.error === 'string' &&
        typeof response.body?.message === 'string';
      if (response.status < 400 || response.status >= 500 || !shaped) {
        problems.push(
          `${sample.kind === 'body' ? sample.target.method.toUpperCase() : 'GET'} ${sample.target.path} → ${response.status} ${JSON.stringify(response.body).slice(0, 200)}`,
        );
        return false;
      }
      return true;
    });
    await Promise.all(
      Array.from({ length: streams }, (_, stream) =>
        fc
          .assert(property, {
            numRuns: REQUESTS / streams,
            seed: seed + stream,
            endOnFailure: true,
          })
          .catch((error: unknown) => {
            problems.push(String(error).slice(0, 2000));
          }),
      ),
    );
    console.info(
      `Bad input: ${REQUESTS} requests, answers ${JSON.stringify(Object.fromEntries([...outcomes].sort()))}, 5xx seen ${[...outcomes].filter(([s]) => s >= 500).reduce((n, [, c]) => n + c, 0)}`,
    );
    expect(problems).toEqual([]);
    const after = await tableFingerprints(access, process.env.DB_NAME!);
    const changed = Object.keys(before).filter(
      (table) => JSON.stringify(before[table]) !== JSON.stringify(after[table]),
    );
    console.info(`Bad input: tables changed ${changed.length}`);
    expect(changed).toEqual([]);
  }, 600_000);
});
