import { roles, type ClaimDetail, type Role } from '@skyledger/contracts';
import { AuditEvent } from '../src/audit/entities/audit-event.entity';
import { Source } from '../src/sources/entities/source.entity';
import { createTestApp, testPassword, type TestApp } from './support/test-app';

const appearance = {
  url: 'https://social.example.test/posts/4412',
  outlet: 'Chirper',
  seenAt: '2026-11-20T10:00:00Z',
  seenTimeZone: 'UTC',
};

const paper = {
  title: 'New estimates of radiative forcing due to well mixed greenhouse gases',
  authors: 'Myhre, G.; Highwood, E. J.; Shine, K. P.; Stordal, F.',
  publisher: 'Geophysical Research Letters',
  year: 1998,
  doi: '10.1029/98GL01908',
  kind: 'peer_reviewed_paper',
  grade: 'strong',
  gradeReason: 'Peer-reviewed primary source for the simplified forcing expressions',
};

const replyAttempt = {
  contacted: 'Office of Councillor Marsh',
  contactedAt: '2026-11-29T09:00:00+00:00',
  channel: 'email',
  deadline: '2026-12-01T17:00:00+00:00',
  outcome: 'awaiting',
};

const consultation = {
  name: 'Dr Ilse Varga',
  affiliation: 'Institute of Earth Heat, University of Lowmoor',
  field: 'Geophysics',
  quote: 'Heat from the interior is tiny next to the greenhouse forcing.',
  consultedOn: '2026-11-30',
  declaredConflicts: 'None declared',
  independentOfClaimant: true,
};

describe('the parts of a claim: appearances, sources, right of reply, experts, comments', () => {
  let t: TestApp;
  const tokens: Partial<Record<Role, string>> = {};
  const ids: Partial<Record<Role, string>> = {};
  const as = (role: Role) => ({ Authorization: `Bearer ${tokens[role]}` });
  let claim: ClaimDetail;
  const path = (rest: string) => `/api/claims/${claim.id}/${rest}`;
  const detail = async () =>
    (await t.http().get(`/api/claims/${claim.id}`).set(as('copy_desk')).expect(200))
      .body as ClaimDetail;
  const lastEvent = async () =>
    (await t.dataSource
      .getRepository(AuditEvent)
      .findOne({ where: { claimId: claim.id }, order: { at: 'DESC', id: 'DESC' } }))!;

  beforeAll(async () => {
    t = await createTestApp('claim_parts');
    for (const role of roles) {
      const user = await t.addUser(role, `${role.replace('_', '-')}@parts.test`);
      ids[role] = user.id;
      tokens[role] = (await t.signIn(user.email, testPassword)).accessToken;
    }
    const filed = await t
      .http()
      .post('/api/claims')
      .set(as('reporter'))
      .send({
        text: 'Carbon dioxide is only 0.04 % of the air, far too little to matter.',
        summary: 'CO2 is too small a share of the air to warm the planet',
        topics: ['co2'],
        claimant: { name: 'Harbour Ratepayers Forum', kind: 'organisation' },
        firstAppearance: appearance,
      });
    expect(filed.status).toBe(201);
    claim = filed.body;
  });
  afterAll(() => t.close());

  describe('appearances', () => {
    it('adds one, keeps a single first-known appearance, and edits with versions', async () => {
      const added = await t
        .http()
        .post(path('appearances'))
        .set(as('reporter'))
        .send({
          ...appearance,
          url: 'https://earlier.example.test/a',
          seenAt: '2026-11-18T08:00:00Z',
          isFirstKnown: true,
        });
      expect(added.status).toBe(201);
      expect(added.body).toMatchObject({
        isFirstKnown: true,
        addedBy: { id: ids.reporter },
        version: 1,
      });
      const appearances = (await detail()).appearances;
      expect(appearances.map((a) => [a.url, a.isFirstKnown])).toEqual([
        ['https://earlier.example.test/a', true],
        [appearance.url, false],
      ]);
      expect((await lastEvent()).action).toBe('appearance.added');

      const edited = await t
        .http()
        .patch(path(`appearances/${added.body.id}`))
        .set(as('science_editor'))
        .send({ outlet: 'Lowmoor Forum', version: 1 });
      expect(edited.status).toBe(200);
      expect(edited.body).toMatchObject({ outlet: 'Lowmoor Forum', version: 2 });
      const stale = await t
        .http()
        .patch(path(`appearances/${added.body.id}`))
        .set(as('science_editor'))
        .send({ outlet: 'Overwritten', version: 1 });
      expect(stale.status).toBe(409);
      expect((await detail()).appearances[0]!.outlet).toBe('Lowmoor Forum');
      const event = await lastEvent();
      expect(event).toMatchObject({ action: 'appearance.updated', actorId: ids.science_editor });
      expect(event.summary).toEqual({ outlet: { from: 'Chirper', to: 'Lowmoor Forum' } });
    });

    it('refuses a capture that is not a file of this claim, bad URLs and other people’s edits', async () => {
      const [first] = (await detail()).appearances;
      const capture = await t
        .http()
        .patch(path(`appearances/${first!.id}`))
        .set(as('reporter'))
        .send({
          captureAttachmentId: '00000000-0000-4000-8000-000000000000',
          version: first!.version,
        });
      expect(capture.status).toBe(422);
      expect(capture.body.fields).toEqual({ captureAttachmentId: 'notOnClaim' });
      const badUrl = await t
        .http()
        .post(path('appearances'))
        .set(as('reporter'))
        .send({ ...appearance, url: 'data:text/html,hi' });
      expect(badUrl.status).toBe(400);
      expect(badUrl.body.fields).toEqual({ url: 'isUrl' });

      await t.addUser('reporter', 'other-reporter@parts.test');
      const other = (await t.signIn('other-reporter@parts.test', testPassword)).accessToken;
      const refused = await t
        .http()
        .patch(path(`appearances/${first!.id}`))
        .set({ Authorization: `Bearer ${other}` })
        .send({ outlet: 'Not mine', version: first!.version });
      expect(refused.status).toBe(403);
      const copy = await t.http().post(path('appearances')).set(as('copy_desk')).send(appearance);
      expect(copy.status).toBe(403);
    });

    it('removes one, audited; unknown parts are 404', async () => {
      const added = await t
        .http()
        .post(path('appearances'))
        .set(as('reporter'))
        .send({ ...appearance, url: 'https://dup.example.test/' });
      const removed = await t
        .http()
        .delete(path(`appearances/${added.body.id}`))
        .set(as('reporter'));
      expect(removed.status).toBe(204);
      expect((await lastEvent()).action).toBe('appearance.removed');
      const again = await t
        .http()
        .delete(path(`appearances/${added.body.id}`))
        .set(as('reporter'));
      expect(again.status).toBe(404);
      const elsewhere = await t
        .http()
        .patch(`/api/claims/00000000-0000-4000-8000-000000000000/appearances/${added.body.id}`)
        .set(as('reporter'))
        .send({ outlet: 'x', version: 1 });
      expect(elsewhere.status).toBe(404);
    });
  });

  describe('sources', () => {
    it('cites a new graded source, then the same source for a second claim', async () => {
      const linked = await t
        .http()
        .post(path('sources'))
        .set(as('reporter'))
        .send({ source: paper });
      expect(linked.status).toBe(201);
      expect(linked.body).toMatchObject({
        ...paper,
        addedBy: { id: ids.reporter },
        linkedBy: { id: ids.reporter },
        version: 1,
      });

      const second = await t
        .http()
        .post('/api/claims')
        .set(as('science_editor'))
        .send({
          text: 'CO2 barely absorbs anything.',
          summary: 'CO2 absorbs too little to matter',
          topics: ['co2'],
          claimantId: claim.claimant.id,
        });
      const reused = await t
        .http()
        .post(`/api/claims/${second.body.id}/sources`)
        .set(as('science_editor'))
        .send({ sourceId: linked.body.id });
      expect(reused.status).toBe(201);
      expect(reused.body.linkedBy).toEqual({
        id: ids.science_editor,
        displayName: 'science-editor',
      });
      expect(await t.dataSource.getRepository(Source).countBy({ doi: paper.doi })).toBe(1);

      const twice = await t
        .http()
        .post(path('sources'))
        .set(as('reporter'))
        .send({ sourceId: linked.body.id });
      expect(twice.status).toBe(409);
      expect(twice.body.fields).toEqual({ sourceId: 'alreadyLinked' });
    });

    it('finds sources by a word of the title or by DOI', async () => {
      const byWord = await t.http().get('/api/sources?q=radiative').set(as('reporter'));
      expect(byWord.body.map((s: { doi: string }) => s.doi)).toEqual([paper.doi]);
      const byDoi = await t
        .http()
        .get(`/api/sources?q=${encodeURIComponent(paper.doi)}`)
        .set(as('reporter'));
      expect(byDoi.body).toHaveLength(1);
    });

    it('asks for a DOI or URL unless the source is an interview, and for a grade reason', async () => {
      const untraceable = await t
        .http()
        .post(path('sources'))
        .set(as('reporter'))
        .send({ source: { ...paper, doi: undefined, title: 'A report someone mentioned' } });
      expect(untraceable.status).toBe(422);
      expect(untraceable.body.fields).toEqual({ url: 'doiOrUrlRequired' });
      const interview = await t
        .http()
        .post(path('sources'))
        .set(as('science_editor'))
        .send({
          source: {
            title: 'Interview with Dr Ilse Varga',
            kind: 'expert_interview',
            grade: 'adequate',
            gradeReason: 'Independent specialist',
          },
        });
      expect(interview.status).toBe(201);
      const bad = await t
        .http()
        .post(path('sources'))
        .set(as('reporter'))
        .send({
          source: { ...paper, grade: 'excellent', gradeReason: '', doi: 'doi:10.1/x', year: 1066 },
        });
      expect(bad.status).toBe(400);
      expect(bad.body.fields).toEqual({
        'source.grade': 'isIn',
        'source.gradeReason': 'isNotEmpty',
        'source.doi': 'matches',
        'source.year': 'min',
      });
      const both = await t.http().post(path('sources')).set(as('reporter')).send({});
      expect(both.status).toBe(400);
      expect(both.body.fields).toEqual({ sourceId: 'oneOfSourceIdOrSource' });
    });

    it('regrades a source with its version; the change shows in the history of every claim citing it', async () => {
      const source = (await detail()).sources.find((s) => s.doi === paper.doi)!;
      const regraded = await t
        .http()
        .patch(`/api/sources/${source.id}`)
        .set(as('science_editor'))
        .send({
          grade: 'adequate',
          gradeReason: 'Superseded by later line-by-line fits',
          version: source.version,
        });
      expect(regraded.status).toBe(200);
      expect(regraded.body).toMatchObject({ grade: 'adequate', version: source.version + 1 });
      const stale = await t
        .http()
        .patch(`/api/sources/${source.id}`)
        .set(as('science_editor'))
        .send({ grade: 'weak', version: source.version });
      expect(stale.status).toBe(409);
      const history = await t.http().get(path('history')).set(as('copy_desk'));
      const update = history.body.find(
        (event: { action: string }) => event.action === 'source.updated',
      );
      expect(update.summary.grade).toEqual({ from: 'strong', to: 'adequate' });
    });

    it('unlinks a source from the claim and keeps the source', async () => {
      const source = (await detail()).sources.find((s) => s.doi === paper.doi)!;
      const copy = await t
        .http()
        .delete(path(`sources/${source.id}`))
        .set(as('copy_desk'));
      expect(copy.status).toBe(403);
      const removed = await t
        .http()
        .delete(path(`sources/${source.id}`))
        .set(as('reporter'));
      expect(removed.status).toBe(204);
      expect((await detail()).sources.map((s) => s.id)).not.toContain(source.id);
      expect(await t.dataSource.getRepository(Source).existsBy({ id: source.id })).toBe(true);
      expect((await lastEvent()).action).toBe('source.unlinked');
    });
  });

  describe('right of reply', () => {
    it('is logged by a science editor, never a reporter, and needs the reply when they replied', async () => {
      const reporter = await t
        .http()
        .post(path('reply-attempts'))
        .set(as('reporter'))
        .send(replyAttempt);
      expect(reporter.status).toBe(403);
      const logged = await t
        .http()
        .post(path('reply-attempts'))
        .set(as('science_editor'))
        .send(replyAttempt);
      expect(logged.status).toBe(201);
      expect(logged.body).toMatchObject({
        contacted: 'Office of Councillor Marsh',
        contactedAt: '2026-11-29T09:00:00.000Z',
        deadline: '2026-12-01T17:00:00.000Z',
        outcome: 'awaiting',
        reply: null,
        loggedBy: { id: ids.science_editor },
      });
      const noText = await t
        .http()
        .patch(path(`reply-attempts/${logged.body.id}`))
        .set(as('science_editor'))
        .send({ outcome: 'replied', version: 1 });
      expect(noText.status).toBe(422);
      expect(noText.body.fields).toEqual({ reply: 'required' });
      const replied = await t
        .http()
        .patch(path(`reply-attempts/${logged.body.id}`))
        .set(as('science_editor'))
        .send({ outcome: 'replied', reply: 'The councillor stands by the remark.', version: 1 });
      expect(replied.status).toBe(200);
      expect(replied.body).toMatchObject({ outcome: 'replied', version: 2 });
      const backwards = await t
        .http()
        .post(path('reply-attempts'))
        .set(as('science_editor'))
        .send({ ...replyAttempt, deadline: '2026-11-01T00:00:00Z' });
      expect(backwards.status).toBe(422);
      expect(backwards.body.fields).toEqual({ deadline: 'beforeContact' });
      const channel = await t
        .http()
        .post(path('reply-attempts'))
        .set(as('science_editor'))
        .send({ ...replyAttempt, channel: 'pigeon' });
      expect(channel.status).toBe(400);
      expect(channel.body.fields).toEqual({ channel: 'isIn' });
    });
  });

  describe('expert consultations', () => {
    it('records who was consulted, their conflicts and independence', async () => {
      const logged = await t
        .http()
        .post(path('consultations'))
        .set(as('desk_chief'))
        .send(consultation);
      expect(logged.status).toBe(201);
      expect(logged.body).toMatchObject({ ...consultation, loggedBy: { id: ids.desk_chief } });
      const missing = await t
        .http()
        .post(path('consultations'))
        .set(as('science_editor'))
        .send({
          ...consultation,
          declaredConflicts: '  ',
          independentOfClaimant: 'yes',
          consultedOn: '30/11/2026',
        });
      expect(missing.status).toBe(400);
      expect(missing.body.fields).toEqual({
        declaredConflicts: 'isNotEmpty',
        independentOfClaimant: 'isBoolean',
        consultedOn: 'isDateString',
      });
      expect((await detail()).consultations).toHaveLength(1);
    });
  });

  describe('comments', () => {
    it('are open to everyone on the desk; only the author edits, the desk chief may remove', async () => {
      const posted = await t
        .http()
        .post(path('comments'))
        .set(as('copy_desk'))
        .send({ body: 'Check the 0.04 % figure against NOAA.' });
      expect(posted.status).toBe(201);
      expect(posted.body).toMatchObject({ author: { id: ids.copy_desk }, editedAt: null });
      const byOther = await t
        .http()
        .patch(path(`comments/${posted.body.id}`))
        .set(as('science_editor'))
        .send({ body: 'Rewritten', version: 1 });
      expect(byOther.status).toBe(403);
      const edited = await t
        .http()
        .patch(path(`comments/${posted.body.id}`))
        .set(as('copy_desk'))
        .send({ body: 'Check the 0.04 % figure against the NOAA record.', version: 1 });
      expect(edited.status).toBe(200);
      expect(edited.body.editedAt).not.toBeNull();
      const empty = await t.http().post(path('comments')).set(as('reporter')).send({ body: '   ' });
      expect(empty.status).toBe(400);
      const removed = await t
        .http()
        .delete(path(`comments/${posted.body.id}`))
        .set(as('desk_chief'));
      expect(removed.status).toBe(204);
      expect((await detail()).comments).toEqual([]);
    });
  });

  describe('claimants', () => {
    it('names a private individual in public only when a desk chief allows it', async () => {
      const created = await t
        .http()
        .post('/api/claimants')
        .set(as('reporter'))
        .send({ name: 'A Lowmoor resident', kind: 'private_individual' });
      expect(created.status).toBe(201);
      expect(created.body.nameShownPublicly).toBe(false);
      const editor = await t
        .http()
        .patch(`/api/claimants/${created.body.id}`)
        .set(as('science_editor'))
        .send({ nameShownPublicly: true, version: 1 });
      expect(editor.status).toBe(403);
      const chief = await t
        .http()
        .patch(`/api/claimants/${created.body.id}`)
        .set(as('desk_chief'))
        .send({ nameShownPublicly: true, version: 1 });
      expect(chief.status).toBe(200);
      expect(chief.body).toMatchObject({ nameShownPublicly: true, version: 2 });
      const badKind = await t
        .http()
        .post('/api/claimants')
        .set(as('reporter'))
        .send({ name: 'X', kind: 'alien' });
      expect(badKind.status).toBe(400);
      expect(badKind.body.fields).toEqual({ kind: 'isIn' });
    });
  });

  it('shows every part on the claim page and every change in the history, in order', async () => {
    const page = await detail();
    expect(page.replyAttempts).toHaveLength(1);
    expect(page.sources.map((s) => s.kind)).toEqual(['expert_interview']);
    const history = await t.http().get(path('history')).set(as('reporter'));
    const actions = history.body.map((event: { action: string }) => event.action);
    expect(actions.slice(0, 3)).toEqual(['claim.filed', 'appearance.added', 'appearance.added']);
    expect(actions).toEqual(
      expect.arrayContaining([
        'source.linked',
        'reply_attempt.updated',
        'consultation.added',
        'comment.removed',
      ]),
    );
  });
});
