import { roles, type ClaimDetail, type ClaimQueueResponse, type Role } from '@skyledger/contracts';
import { AuditEvent } from '../src/audit/entities/audit-event.entity';
import { Claim } from '../src/claims/entities/claim.entity';
import { createTestApp, testPassword, type TestApp } from './support/test-app';

const firstAppearance = {
  url: 'https://video.marrowby.test/watch/core-heat',
  outlet: 'Marrowby Community Radio',
  seenAt: '2026-11-28T19:30:00+00:00',
  seenTimeZone: 'Europe/London',
};

const newClaim = (overrides: Record<string, unknown> = {}) => ({
  text: 'The heat from the Earth’s core is what is really warming the planet.',
  summary: 'Earth’s core heat, not greenhouse gases, drives warming',
  topics: ['Geothermal', 'attribution'],
  claimant: {
    name: 'Councillor Edwyn Marsh',
    kind: 'public_figure',
    affiliation: 'Marrowby Council',
  },
  firstAppearance,
  ...overrides,
});

describe('claims: filing, the queue, editing, assignment', () => {
  let t: TestApp;
  const tokens: Partial<Record<Role, string>> = {};
  const ids: Partial<Record<Role, string>> = {};
  const as = (role: Role) => ({ Authorization: `Bearer ${tokens[role]}` });

  const file = async (role: Role = 'reporter', overrides: Record<string, unknown> = {}) => {
    const response = await t.http().post('/api/claims').set(as(role)).send(newClaim(overrides));
    expect(response.status).toBe(201);
    return response.body as ClaimDetail;
  };
  const eventsOf = (claimId: string) =>
    t.dataSource.getRepository(AuditEvent).find({ where: { claimId }, order: { at: 'ASC' } });

  beforeAll(async () => {
    t = await createTestApp('claims');
    for (const role of roles) {
      const user = await t.addUser(role, `${role.replace('_', '-')}@claims.test`);
      ids[role] = user.id;
      tokens[role] = (await t.signIn(user.email, testPassword)).accessToken;
    }
  });
  afterAll(() => t.close());

  it('files a claim with a new claimant and its first appearance, audited in the same go', async () => {
    const claim = await file();
    expect(claim).toMatchObject({
      status: 'filed',
      summary: 'Earth’s core heat, not greenhouse gases, drives warming',
      topics: ['attribution', 'geothermal'],
      legalReview: false,
      assignee: null,
      filedBy: { id: ids.reporter },
      claimant: { name: 'Councillor Edwyn Marsh', kind: 'public_figure', nameShownPublicly: true },
      version: 1,
    });
    expect(claim.appearances).toHaveLength(1);
    expect(claim.appearances[0]).toMatchObject({
      url: firstAppearance.url,
      seenAt: '2026-11-28T19:30:00.000Z',
      seenTimeZone: 'Europe/London',
      isFirstKnown: true,
      addedBy: { id: ids.reporter },
    });
    const actions = (await eventsOf(claim.id)).map((event) => event.action);
    expect(actions).toEqual(['claim.filed', 'appearance.added']);

    const history = await t.http().get(`/api/claims/${claim.id}/history`).set(as('copy_desk'));
    expect(history.status).toBe(200);
    expect(history.body.map((event: { action: string }) => event.action)).toEqual(actions);
    expect(history.body[0].actor).toEqual({ id: ids.reporter, displayName: 'reporter' });
  });

  it('keeps the seen-at instant exact whatever offset it was given in', async () => {
    const claim = await file('reporter', {
      firstAppearance: {
        ...firstAppearance,
        seenAt: '2026-11-29T08:15:30.250+05:30',
        seenTimeZone: 'Asia/Kolkata',
      },
    });
    expect(claim.appearances[0]!.seenAt).toBe('2026-11-29T02:45:30.250Z');
    expect(claim.appearances[0]!.seenTimeZone).toBe('Asia/Kolkata');
  });

  it('refuses bad bodies with every broken field named, and stores nothing', async () => {
    const before = await t.dataSource.getRepository(Claim).count();
    const response = await t
      .http()
      .post('/api/claims')
      .set(as('reporter'))
      .send(
        newClaim({
          summary: 'x'.repeat(76),
          topics: ['Sea level!'],
          legalReview: 'yes',
          firstAppearance: {
            ...firstAppearance,
            url: 'javascript:alert(1)',
            seenTimeZone: 'Mars/Olympus',
            seenAt: '2026-11-28 19:30',
          },
          colour: 'red',
        }),
      );
    expect(response.status).toBe(400);
    expect(response.body).toMatchObject({ statusCode: 400, error: 'Bad Request' });
    expect(response.body.fields).toEqual({
      summary: 'maxLength',
      topics: 'matches',
      legalReview: 'isBoolean',
      'firstAppearance.url': 'isUrl',
      'firstAppearance.seenAt': 'isIso8601',
      'firstAppearance.seenTimeZone': 'isTimeZone',
      colour: 'notAllowed',
    });
    const neither = await t
      .http()
      .post('/api/claims')
      .set(as('reporter'))
      .send(newClaim({ claimant: undefined }));
    expect(neither.status).toBe(400);
    expect(neither.body.fields).toEqual({ claimantId: 'oneOfClaimantIdOrClaimant' });
    const unknownClaimant = await t
      .http()
      .post('/api/claims')
      .set(as('reporter'))
      .send(newClaim({ claimant: undefined, claimantId: '00000000-0000-4000-8000-000000000000' }));
    expect(unknownClaimant.status).toBe(422);
    expect(unknownClaimant.body.fields).toEqual({ claimantId: 'notFound' });
    const notJson = await t
      .http()
      .post('/api/claims')
      .set(as('reporter'))
      .set('Content-Type', 'application/json')
      .send('{"text": ');
    expect(notJson.status).toBe(400);
    expect(await t.dataSource.getRepository(Claim).count()).toBe(before);
  });

  it('lets only the desk roles that file do so; copy desk and callers without a sign-in may not', async () => {
    const copy = await t.http().post('/api/claims').set(as('copy_desk')).send(newClaim());
    expect(copy.status).toBe(403);
    const anonymous = await t.http().post('/api/claims').send(newClaim());
    expect(anonymous.status).toBe(401);
    const anonymousRead = await t.http().get('/api/claims');
    expect(anonymousRead.status).toBe(401);
  });

  it('answers 404 for unknown claims and 400 for ids that are not UUIDs', async () => {
    const missing = await t
      .http()
      .get('/api/claims/00000000-0000-4000-8000-000000000000')
      .set(as('reporter'));
    expect(missing.status).toBe(404);
    expect(missing.body).toEqual({ statusCode: 404, error: 'Not Found', message: 'No such claim' });
    const bad = await t.http().get('/api/claims/not-a-uuid').set(as('reporter'));
    expect(bad.status).toBe(400);
    expect(bad.body.fields).toEqual({ id: 'isUuid' });
    const history = await t
      .http()
      .get('/api/claims/00000000-0000-4000-8000-000000000000/history')
      .set(as('reporter'));
    expect(history.status).toBe(404);
  });

  it('picks an existing claimant by id and finds claimants by the start of any word', async () => {
    const found = await t.http().get('/api/claimants?q=mar').set(as('reporter'));
    expect(found.status).toBe(200);
    expect(found.body.map((c: { name: string }) => c.name)).toContain('Councillor Edwyn Marsh');
    const wildcard = await t.http().get('/api/claimants?q=%25').set(as('reporter'));
    expect(wildcard.body).toEqual([]);
    const claimantId = found.body[0].id as string;
    const claim = await file('science_editor', {
      claimant: undefined,
      claimantId,
      firstAppearance: undefined,
    });
    expect(claim.claimant.id).toBe(claimantId);
    expect(claim.appearances).toEqual([]);
  });

  it('edits with the current version, and a stale version gets 409 with nothing overwritten', async () => {
    const claim = await file();
    const edited = await t
      .http()
      .patch(`/api/claims/${claim.id}`)
      .set(as('reporter'))
      .send({
        summary: 'Core heat drives warming, says councillor',
        topics: ['geothermal'],
        version: 1,
      });
    expect(edited.status).toBe(200);
    expect(edited.body).toMatchObject({
      summary: 'Core heat drives warming, says councillor',
      topics: ['geothermal'],
      version: 2,
    });

    const stale = await t
      .http()
      .patch(`/api/claims/${claim.id}`)
      .set(as('science_editor'))
      .send({ summary: 'Overwrite', version: 1 });
    expect(stale.status).toBe(409);
    expect(stale.body.fields).toEqual({ version: 'stale' });
    expect(stale.body.message).toContain('now version 2');
    const after = await t.http().get(`/api/claims/${claim.id}`).set(as('reporter'));
    expect(after.body.summary).toBe('Core heat drives warming, says councillor');

    const events = await eventsOf(claim.id);
    const update = events.find((event) => event.action === 'claim.updated')!;
    expect(update.actorId).toBe(ids.reporter);
    expect(update.summary).toEqual({
      summary: {
        from: 'Earth’s core heat, not greenhouse gases, drives warming',
        to: 'Core heat drives warming, says councillor',
      },
      topics: { from: ['attribution', 'geothermal'], to: ['geothermal'] },
    });
  });

  it('lets a reporter edit only their own claims, and only while they are filed', async () => {
    const others = await file('science_editor');
    const refused = await t
      .http()
      .patch(`/api/claims/${others.id}`)
      .set(as('reporter'))
      .send({ summary: 'Mine now', version: 1 });
    expect(refused.status).toBe(403);
    const copy = await t
      .http()
      .patch(`/api/claims/${others.id}`)
      .set(as('copy_desk'))
      .send({ summary: 'Copy', version: 1 });
    expect(copy.status).toBe(403);

    const own = await file('reporter');
    const taken = await t
      .http()
      .post(`/api/claims/${own.id}/assign`)
      .set(as('science_editor'))
      .send({ assigneeId: ids.science_editor, version: 1 });
    expect(taken.status).toBe(200);
    const late = await t
      .http()
      .patch(`/api/claims/${own.id}`)
      .set(as('reporter'))
      .send({ summary: 'Too late', version: 2 });
    expect(late.status).toBe(403);
    expect(late.body.message).toContain('until research starts');
  });

  it('sets the legal-review flag for anyone who may edit, but only a desk chief clears it', async () => {
    const claim = await file('reporter', { legalReview: true });
    expect(claim.legalReview).toBe(true);
    const editor = await t
      .http()
      .patch(`/api/claims/${claim.id}`)
      .set(as('science_editor'))
      .send({ legalReview: false, version: 1 });
    expect(editor.status).toBe(403);
    const chief = await t
      .http()
      .patch(`/api/claims/${claim.id}`)
      .set(as('desk_chief'))
      .send({ legalReview: false, version: 1 });
    expect(chief.status).toBe(200);
    expect(chief.body.legalReview).toBe(false);
  });

  describe('assignment', () => {
    it('lets a science editor take an unassigned claim, moving it into research, and mails nobody', async () => {
      const claim = await file();
      const taken = await t
        .http()
        .post(`/api/claims/${claim.id}/assign`)
        .set(as('science_editor'))
        .send({ assigneeId: ids.science_editor, version: 1 });
      expect(taken.status).toBe(200);
      expect(taken.body).toMatchObject({
        status: 'in_research',
        assignee: { id: ids.science_editor },
        version: 2,
      });
      const event = (await eventsOf(claim.id)).find((e) => e.action === 'claim.assigned')!;
      expect(event.summary).toMatchObject({
        assignee: { from: null, to: ids.science_editor },
        status: { from: 'filed', to: 'in_research' },
      });
    });

    it('refuses a science editor giving a claim to someone else or taking one already taken', async () => {
      const claim = await file();
      const give = await t
        .http()
        .post(`/api/claims/${claim.id}/assign`)
        .set(as('science_editor'))
        .send({ assigneeId: ids.desk_chief, version: 1 });
      expect(give.status).toBe(403);
      await t
        .http()
        .post(`/api/claims/${claim.id}/assign`)
        .set(as('desk_chief'))
        .send({ assigneeId: ids.desk_chief, version: 1 })
        .expect(200);
      const take = await t
        .http()
        .post(`/api/claims/${claim.id}/assign`)
        .set(as('science_editor'))
        .send({ assigneeId: ids.science_editor, version: 2 });
      expect(take.status).toBe(409);
      expect(take.body.fields).toEqual({ assigneeId: 'taken' });
      const reporter = await t
        .http()
        .post(`/api/claims/${claim.id}/assign`)
        .set(as('reporter'))
        .send({ assigneeId: ids.reporter, version: 2 });
      expect(reporter.status).toBe(403);
    });

    it('lets a desk chief assign a science editor, who gets a mail; never a reporter or copy desk', async () => {
      const claim = await file();
      const toReporter = await t
        .http()
        .post(`/api/claims/${claim.id}/assign`)
        .set(as('desk_chief'))
        .send({ assigneeId: ids.reporter, version: 1 });
      expect(toReporter.status).toBe(422);
      expect(toReporter.body.fields).toEqual({ assigneeId: 'notAssignable' });
      const unknown = await t
        .http()
        .post(`/api/claims/${claim.id}/assign`)
        .set(as('desk_chief'))
        .send({ assigneeId: '00000000-0000-4000-8000-000000000000', version: 1 });
      expect(unknown.status).toBe(422);
      const given = await t
        .http()
        .post(`/api/claims/${claim.id}/assign`)
        .set(as('desk_chief'))
        .send({ assigneeId: ids.science_editor, version: 1 });
      expect(given.status).toBe(200);
      const mail = await t.mail.waitFor(
        (m) => m.to.includes('science-editor@claims.test') && m.subject.includes(claim.summary),
      );
      expect(mail.text).toContain(`http://127.0.0.1:3000/claims/${claim.id}`);
      const stale = await t
        .http()
        .post(`/api/claims/${claim.id}/assign`)
        .set(as('desk_chief'))
        .send({ assigneeId: null, version: 1 });
      expect(stale.status).toBe(409);
      const off = await t
        .http()
        .post(`/api/claims/${claim.id}/assign`)
        .set(as('desk_chief'))
        .send({ assigneeId: null, version: 2 });
      expect(off.body).toMatchObject({ assignee: null, status: 'in_research' });
    });
  });

  describe('setting aside', () => {
    it('is the desk chief’s alone, needs a reason, and freezes the claim', async () => {
      const claim = await file();
      const editor = await t
        .http()
        .post(`/api/claims/${claim.id}/transitions`)
        .set(as('science_editor'))
        .send({ to: 'set_aside', reason: 'duplicate', version: 1 });
      expect(editor.status).toBe(403);
      const noReason = await t
        .http()
        .post(`/api/claims/${claim.id}/transitions`)
        .set(as('desk_chief'))
        .send({ to: 'set_aside', version: 1 });
      expect(noReason.status).toBe(422);
      expect(noReason.body.fields).toEqual({ reason: 'required' });
      const notYet = await t
        .http()
        .post(`/api/claims/${claim.id}/transitions`)
        .set(as('desk_chief'))
        .send({ to: 'published', version: 1 });
      expect(notYet.status).toBe(422);
      const aside = await t
        .http()
        .post(`/api/claims/${claim.id}/transitions`)
        .set(as('desk_chief'))
        .send({
          to: 'set_aside',
          reason: 'duplicate',
          note: 'Same as the claim filed on Monday',
          version: 1,
        });
      expect(aside.status).toBe(200);
      expect(aside.body).toMatchObject({
        status: 'set_aside',
        setAsideReason: 'duplicate',
        setAsideNote: 'Same as the claim filed on Monday',
      });
      const again = await t
        .http()
        .post(`/api/claims/${claim.id}/transitions`)
        .set(as('desk_chief'))
        .send({ to: 'set_aside', reason: 'duplicate', version: 2 });
      expect(again.status).toBe(422);
      expect(again.body.fields).toEqual({ to: 'notFromHere' });
      const edit = await t
        .http()
        .patch(`/api/claims/${claim.id}`)
        .set(as('desk_chief'))
        .send({ summary: 'Revived', version: 2 });
      expect(edit.status).toBe(422);
      const event = (await eventsOf(claim.id)).find((e) => e.action === 'claim.set_aside')!;
      expect(event.summary).toMatchObject({
        status: { from: 'filed', to: 'set_aside' },
        reason: 'duplicate',
      });
    });
  });

  describe('the queue', () => {
    let queueClaimant: string;
    beforeAll(async () => {
      const claimant = await t
        .http()
        .post('/api/claimants')
        .set(as('reporter'))
        .send({ name: 'Queue Test Society', kind: 'organisation' });
      expect(claimant.status).toBe(201);
      queueClaimant = claimant.body.id;
      for (const [index, topic] of ['solar', 'solar', 'sea-ice'].entries()) {
        const claim = await file('reporter', {
          claimant: undefined,
          claimantId: queueClaimant,
          summary: `Queue claim ${index}`,
          topics: [topic],
          legalReview: index === 2,
        });
        if (index === 1) {
          await t
            .http()
            .post(`/api/claims/${claim.id}/assign`)
            .set(as('science_editor'))
            .send({ assigneeId: ids.science_editor, version: 1 })
            .expect(200);
        }
      }
    });
    const queue = async (query: string, role: Role = 'science_editor') => {
      const response = await t
        .http()
        .get(`/api/claims?claimant=${queueClaimant}&${query}`)
        .set(as(role));
      expect(response.status).toBe(200);
      return response.body as ClaimQueueResponse;
    };

    it('filters by claimant, topic, status, assignee, legal flag and filing date, with counts per status', async () => {
      const all = await queue('');
      expect(all.total).toBe(3);
      expect(all.counts).toMatchObject({ filed: 2, in_research: 1, published: 0 });
      expect((await queue('topic=solar')).items.map((c) => c.summary).sort()).toEqual([
        'Queue claim 0',
        'Queue claim 1',
      ]);
      const filed = await queue('status=filed');
      expect(filed.total).toBe(2);
      expect(filed.counts.in_research).toBe(1);
      expect((await queue(`assignee=${ids.science_editor}`)).items.map((c) => c.summary)).toEqual([
        'Queue claim 1',
      ]);
      expect((await queue('assignee=none')).total).toBe(2);
      expect((await queue('legal=true')).items.map((c) => c.summary)).toEqual(['Queue claim 2']);
      expect((await queue('legal=false')).total).toBe(2);
      const today = new Date().toISOString().slice(0, 10);
      expect((await queue(`filedFrom=${today}&filedTo=${today}`)).total).toBe(3);
      expect((await queue('filedTo=2020-01-01')).total).toBe(0);
    });

    it('reads “mine” as assigned to me, or filed by me for a reporter', async () => {
      expect((await queue('mine=true', 'science_editor')).items.map((c) => c.summary)).toEqual([
        'Queue claim 1',
      ]);
      expect((await queue('mine=true', 'reporter')).total).toBe(3);
      expect((await queue('mine=true', 'copy_desk')).total).toBe(0);
    });

    it('sorts and pages, with the total across pages', async () => {
      const first = await queue('sort=summary&order=asc&pageSize=2&page=1');
      expect(first).toMatchObject({ total: 3, page: 1, pageSize: 2 });
      expect(first.items.map((c) => c.summary)).toEqual(['Queue claim 0', 'Queue claim 1']);
      const second = await queue('sort=summary&order=asc&pageSize=2&page=2');
      expect(second.items.map((c) => c.summary)).toEqual(['Queue claim 2']);
      const newest = await queue('');
      expect(newest.items[0]!.summary).toBe('Queue claim 2');
      expect(newest.items[0]).toMatchObject({
        claimant: { name: 'Queue Test Society', kind: 'organisation' },
        topics: ['sea-ice'],
        legalReview: true,
      });
    });

    it('refuses bad filters by name', async () => {
      const response = await t
        .http()
        .get(
          '/api/claims?status=lost&pageSize=500&mine=maybe&filedFrom=yesterday&assignee=someone&sort=colour',
        )
        .set(as('reporter'));
      expect(response.status).toBe(400);
      expect(response.body.fields).toEqual({
        status: 'isIn',
        pageSize: 'max',
        mine: 'isBoolean',
        filedFrom: 'isDateString',
        assignee: 'isUuid',
        sort: 'isIn',
      });
    });
  });

  it('lists the active people on the desk for every role', async () => {
    const response = await t.http().get('/api/people').set(as('reporter'));
    expect(response.status).toBe(200);
    expect(response.body).toContainEqual({
      id: ids.science_editor,
      displayName: 'science-editor',
      role: 'science_editor',
    });
    expect(Object.keys(response.body[0]).sort()).toEqual(['displayName', 'id', 'role']);
  });

  it('documents every claims-desk route with its request body in the OpenAPI document', async () => {
    const docs = (await t.http().get('/api/docs-json').expect(200)).body as {
      paths: Record<string, Record<string, { requestBody?: unknown }>>;
    };
    const bodies = [
      ['/api/claims', 'post'],
      ['/api/claims/{id}', 'patch'],
      ['/api/claims/{id}/assign', 'post'],
      ['/api/claims/{id}/transitions', 'post'],
      ['/api/claims/{id}/appearances', 'post'],
      ['/api/claims/{id}/appearances/{partId}', 'patch'],
      ['/api/claims/{id}/reply-attempts', 'post'],
      ['/api/claims/{id}/consultations/{partId}', 'patch'],
      ['/api/claims/{id}/comments', 'post'],
      ['/api/claims/{id}/sources', 'post'],
      ['/api/sources/{id}', 'patch'],
      ['/api/claimants', 'post'],
    ] as const;
    for (const [path, method] of bodies) {
      expect({ path, method, body: Boolean(docs.paths[path]?.[method]?.requestBody) }).toEqual({
        path,
        method,
        body: true,
      });
    }
    expect(docs.paths['/api/claims/{id}/history']?.get).toBeDefined();
    expect(docs.paths['/api/people']?.get).toBeDefined();
  });
});
