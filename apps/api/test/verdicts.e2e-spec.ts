import {
  type ClaimDetail,
  type ClaimStatus,
  type ClaimVerdictView,
  type RatingLevelView,
  type Role,
  type SignoffView,
  type VerdictVersionView,
  type WorkingRerunResponse,
} from '@skyledger/contracts';
import { AuditEvent } from '../src/audit/entities/audit-event.entity';
import { Claim } from '../src/claims/entities/claim.entity';
import { Working } from '../src/workings/entities/working.entity';
import { createTestApp, testPassword, type TestApp } from './support/test-app';

type Person = 'reporter' | 'editor' | 'editor2' | 'copy' | 'chief' | 'chief2';
const people: Record<Person, Role> = {
  reporter: 'reporter',
  editor: 'science_editor',
  editor2: 'science_editor',
  copy: 'copy_desk',
  chief: 'desk_chief',
  chief2: 'desk_chief',
};

const paragraph = (text: string) => ({ type: 'paragraph', content: [{ type: 'text', text }] });

describe('verdicts, the claim life and sign-off', () => {
  let t: TestApp;
  const tokens = {} as Record<Person, string>;
  const ids = {} as Record<Person, string>;
  const as = (person: Person) => ({ Authorization: `Bearer ${tokens[person]}` });

  /** A claim researched by `editor`, with a strong source, a reply attempt and a working. */
  async function researchedClaim(
    summary: string,
    claimant: { name: string; kind: string } = {
      name: `Claimant of ${summary}`,
      kind: 'public_figure',
    },
  ): Promise<{ claim: ClaimDetail; sourceId: string; workingId: string }> {
    const filed = await t
      .http()
      .post('/api/claims')
      .set(as('reporter'))
      .send({
        text: `${summary}, said at the harbour meeting.`,
        summary,
        topics: ['geothermal'],
        claimant,
      });
    expect(filed.status).toBe(201);
    const claim = filed.body as ClaimDetail;
    const assigned = await t
      .http()
      .post(`/api/claims/${claim.id}/assign`)
      .set(as('editor'))
      .send({ assigneeId: ids.editor, version: claim.version });
    expect(assigned.status).toBe(200);
    const source = await t
      .http()
      .post(`/api/claims/${claim.id}/sources`)
      .set(as('editor'))
      .send({
        source: {
          title: 'Heat flow from the Earth’s interior: analysis of the global data set',
          authors: 'Pollack, H. N.; Hurter, S. J.; Johnson, J. R.',
          publisher: 'Reviews of Geophysics',
          year: 1993,
          doi: '10.1029/93RG01249',
          kind: 'peer_reviewed_paper',
          grade: 'strong',
          gradeReason: 'The standard compilation of global heat-flow measurements',
        },
      });
    expect(source.status).toBe(201);
    const attempt = await t
      .http()
      .post(`/api/claims/${claim.id}/reply-attempts`)
      .set(as('editor'))
      .send({
        contacted: 'The claimant’s office',
        contactedAt: '2026-11-29T09:00:00+00:00',
        channel: 'email',
        outcome: 'no_reply',
      });
    expect(attempt.status).toBe(201);
    const working = await t
      .http()
      .post(`/api/claims/${claim.id}/workings`)
      .set(as('editor'))
      .send({ calculatorId: 'heat-flux-compare', inputs: {} });
    expect(working.status).toBe(201);
    return { claim: await detail(claim.id), sourceId: source.body.id, workingId: working.body.id };
  }

  const detail = async (claimId: string) =>
    (await t.http().get(`/api/claims/${claimId}`).set(as('copy')).expect(200)).body as ClaimDetail;
  const verdict = async (claimId: string) =>
    (await t.http().get(`/api/claims/${claimId}/verdict`).set(as('copy')).expect(200))
      .body as ClaimVerdictView;
  const move = async (claimId: string, who: Person, to: ClaimStatus, extra: object = {}) =>
    t
      .http()
      .post(`/api/claims/${claimId}/transitions`)
      .set(as(who))
      .send({ to, version: (await detail(claimId)).version, ...extra });
  const draft = (claimId: string, who: Person, body: object = {}) =>
    t.http().post(`/api/claims/${claimId}/verdict/versions`).set(as(who)).send(body);
  const save = (claimId: string, version: VerdictVersionView, who: Person, body: object) =>
    t
      .http()
      .patch(`/api/claims/${claimId}/verdict/versions/${version.id}`)
      .set(as(who))
      .send({ version: version.version, ...body });

  /** A complete draft: rating, bottom line, an explainer citing the source and embedding the working. */
  async function completeDraft(
    claimId: string,
    sourceId: string,
    workingId: string,
    who: Person = 'editor',
  ) {
    const started = await draft(claimId, who);
    expect(started.status).toBe(201);
    const saved = await save(claimId, started.body, who, {
      ratingId: 'contradicted',
      bottomLine:
        'The Earth’s interior gives off about 0.09 W/m², some thirty times less than greenhouse forcing.',
      primarySourceId: sourceId,
      body: {
        type: 'doc',
        content: [
          {
            type: 'paragraph',
            content: [
              { type: 'text', text: 'Heat from the interior is tiny' },
              { type: 'sourceCitation', attrs: { sourceId } },
            ],
          },
          { type: 'workingEmbed', attrs: { workingId } },
        ],
      },
    });
    expect(saved.status).toBe(200);
    return saved.body as VerdictVersionView;
  }

  beforeAll(async () => {
    t = await createTestApp('verdicts');
    for (const [person, role] of Object.entries(people) as Array<[Person, Role]>) {
      const user = await t.addUser(role, `${person}@verdicts.test`);
      ids[person] = user.id;
      tokens[person] = (await t.signIn(user.email, testPassword)).accessToken;
    }
  });
  afterAll(() => t.close());

  describe('the rating scale', () => {
    it('ships the default scale, readable by the whole desk', async () => {
      expect((await t.http().get('/api/rating-levels')).status).toBe(401);
      const response = await t.http().get('/api/rating-levels').set(as('reporter'));
      expect(response.status).toBe(200);
      const levels = response.body as RatingLevelView[];
      expect(levels.map((level) => [level.id, level.number, level.label, level.isRating])).toEqual([
        ['holds-up', 5, 'Holds up', true],
        ['holds-with-caveats', 4, 'Holds up with caveats', true],
        ['stretched', 3, 'Stretched', true],
        ['unfounded', 2, 'Unfounded', true],
        ['contradicted', 1, 'Contradicted by evidence', true],
        ['not-checkable', null, 'Not checkable', false],
      ]);
    });

    it('lets a desk chief edit the words with versions, and nobody else', async () => {
      const edit = (who: Person, version: number) =>
        t
          .http()
          .patch('/api/rating-levels/stretched')
          .set(as(who))
          .send({ description: 'Goes further than the evidence allows.', version });
      expect((await edit('editor', 1)).status).toBe(403);
      const edited = await edit('chief', 1);
      expect(edited.status).toBe(200);
      expect(edited.body).toMatchObject({
        description: 'Goes further than the evidence allows.',
        version: 2,
      });
      expect((await edit('chief', 1)).status).toBe(409);
      const bad = await t
        .http()
        .patch('/api/rating-levels/stretched')
        .set(as('chief'))
        .send({ label: '', version: 2 });
      expect(bad.status).toBe(400);
      expect(Object.keys(bad.body.fields)).toEqual(['label']);
    });

    it('adds a level, deletes an unused one, and refuses to delete one in use', async () => {
      const added = await t.http().post('/api/rating-levels').set(as('chief')).send({
        id: 'too-early',
        number: null,
        label: 'Too early to say',
        description: 'Evidence still coming in.',
        isRating: false,
      });
      expect(added.status).toBe(201);
      expect((await t.http().delete('/api/rating-levels/too-early').set(as('chief'))).status).toBe(
        204,
      );
      const { claim, sourceId, workingId } = await researchedClaim(
        'A level in use stays on the scale',
      );
      await completeDraft(claim.id, sourceId, workingId);
      const refused = await t.http().delete('/api/rating-levels/contradicted').set(as('chief'));
      expect(refused.status).toBe(409);
      expect(refused.body.fields).toEqual({ id: 'inUse' });
      const levels = (await t.http().get('/api/rating-levels').set(as('copy')))
        .body as RatingLevelView[];
      expect(levels.find((level) => level.id === 'contradicted')).toMatchObject({ inUse: true });
    });
  });

  describe('drafting', () => {
    it('starts from the template: the fact first, then the claim, then why it misleads', async () => {
      const { claim } = await researchedClaim('The template leads with the fact');
      const started = await draft(claim.id, 'editor');
      expect(started.status).toBe(201);
      const version = started.body as VerdictVersionView;
      expect(version).toMatchObject({
        number: 1,
        state: 'draft',
        ratingId: null,
        draftedBy: { id: ids.editor },
      });
      const headings = [...version.bodyHtml.matchAll(/<h2>([^<]+)<\/h2>/g)].map((m) => m[1]);
      expect(headings).toEqual(['What the evidence shows', 'The claim', 'Why it misleads']);
      expect(version.bodyHtml).toContain(claim.text);
      expect(version.bodyHtml).toContain('Claimant of The template leads with the fact');
      const again = await draft(claim.id, 'chief');
      expect(again.status).toBe(409);
      expect(again.body.fields).toEqual({ verdict: 'draftExists' });
      for (const who of ['reporter', 'copy'] as const) {
        expect((await draft(claim.id, who)).status).toBe(403);
      }
    });

    it('names a private individual in the template only as readers may see them', async () => {
      const { claim } = await researchedClaim('A neighbour’s claim about the core', {
        name: 'Winifred Oddlestone',
        kind: 'private_individual',
      });
      const started = await draft(claim.id, 'editor');
      expect(started.status).toBe(201);
      const { bodyHtml } = started.body as VerdictVersionView;
      // Left as it is, the template's line would be published: the name must not be in it.
      expect(bodyHtml).not.toContain('Winifred Oddlestone');
      expect(bodyHtml).toContain('Who said it (A private individual), where and when.');
    });

    it('renders citations and embedded workings, and strips scripts and javascript: links', async () => {
      const { claim, sourceId, workingId } = await researchedClaim('Sanitizing the explainer body');
      const started = (await draft(claim.id, 'editor')).body as VerdictVersionView;
      const saved = await save(claim.id, started, 'editor', {
        body: {
          type: 'doc',
          content: [
            {
              type: 'paragraph',
              content: [
                {
                  type: 'text',
                  text: 'See ',
                  marks: [{ type: 'link', attrs: { href: 'javascript:alert(1)' } }],
                },
                { type: 'text', text: '<script>alert(2)</script>' },
                { type: 'sourceCitation', attrs: { sourceId } },
              ],
            },
            { type: 'script', content: [{ type: 'text', text: 'alert(3)' }] },
            { type: 'workingEmbed', attrs: { workingId } },
          ],
        },
      });
      expect(saved.status).toBe(200);
      const version = saved.body as VerdictVersionView;
      expect(version.bodyHtml).not.toMatch(/<script|javascript:|alert\(3\)/);
      expect(version.bodyHtml).toContain('&lt;script&gt;alert(2)&lt;/script&gt;');
      expect(version.bodyHtml).toContain(
        `<a class="citation" data-source-id="${sourceId}" href="#source-${sourceId}">[1]</a>`,
      );
      expect(version.bodyHtml).toContain(`data-working-id="${workingId}"`);
      expect(JSON.stringify(version.body)).not.toMatch(/javascript:|"script"/);
      expect(version).toMatchObject({
        citedSourceIds: [sourceId],
        embeddedWorkingIds: [workingId],
      });
    });

    it('refuses citations of sources and workings that are not the claim’s', async () => {
      const one = await researchedClaim('Citations stay on their claim, one');
      const other = await researchedClaim('Citations stay on their claim, two');
      const started = (await draft(one.claim.id, 'editor')).body as VerdictVersionView;
      const foreignSource = await save(one.claim.id, started, 'editor', {
        body: {
          type: 'doc',
          content: [
            {
              type: 'paragraph',
              content: [{ type: 'sourceCitation', attrs: { sourceId: other.sourceId } }],
            },
          ],
        },
      });
      expect(foreignSource.status).toBe(422);
      expect(foreignSource.body.fields).toEqual({ body: 'citesUnlinkedSource' });
      const foreignWorking = await save(one.claim.id, started, 'editor', {
        body: {
          type: 'doc',
          content: [{ type: 'workingEmbed', attrs: { workingId: other.workingId } }],
        },
      });
      expect(foreignWorking.body.fields).toEqual({ body: 'embedsForeignWorking' });
      const badRating = await save(one.claim.id, started, 'editor', { ratingId: 'sort-of' });
      expect(badRating.body.fields).toEqual({ ratingId: 'unknownRating' });
    });

    it('answers two saves of the same version with one 409, keeping both texts', async () => {
      const { claim } = await researchedClaim('Two editors save at once');
      const started = (await draft(claim.id, 'editor')).body as VerdictVersionView;
      const first = await save(claim.id, started, 'editor', {
        body: { type: 'doc', content: [paragraph('First editor’s words.')] },
      });
      const second = await save(claim.id, started, 'chief', {
        body: { type: 'doc', content: [paragraph('Second editor’s words.')] },
      });
      expect([first.status, second.status]).toEqual([200, 409]);
      expect(second.body.fields).toEqual({ version: 'stale' });
      const view = await verdict(claim.id);
      expect(view.versions[0]!.bodyHtml).toBe('<p>First editor’s words.</p>');
      expect(view.conflicts).toHaveLength(1);
      expect(view.conflicts[0]).toMatchObject({
        versionId: started.id,
        savedBy: { id: ids.chief },
        body: { type: 'doc', content: [paragraph('Second editor’s words.')] },
      });
    });
  });

  describe('the claim life', () => {
    it('lets only the roles PRODUCT.md names make each move', async () => {
      const { claim, sourceId, workingId } = await researchedClaim('Who may move a claim');
      await completeDraft(claim.id, sourceId, workingId);
      for (const who of ['reporter', 'copy', 'editor2'] as const) {
        expect({ who, status: (await move(claim.id, who, 'awaiting_signoff')).status }).toEqual({
          who,
          status: 403,
        });
      }
      expect((await move(claim.id, 'editor', 'cleared')).status).toBe(403);
      expect((await move(claim.id, 'copy', 'cleared')).status).toBe(422); // not awaiting sign-off yet
      expect((await move(claim.id, 'editor', 'published')).status).toBe(422); // not this way
      expect((await move(claim.id, 'editor', 'awaiting_signoff')).status).toBe(200);
      for (const who of ['reporter', 'editor', 'editor2'] as const) {
        expect({
          who,
          status: (await move(claim.id, who, 'sent_back', { note: 'x' })).status,
        }).toEqual({ who, status: 403 });
      }
      for (const who of ['reporter', 'editor', 'copy'] as const) {
        expect({
          who,
          status: (await move(claim.id, who, 'set_aside', { reason: 'duplicate' })).status,
        }).toEqual({ who, status: 403 });
      }
      const stale = await t
        .http()
        .post(`/api/claims/${claim.id}/transitions`)
        .set(as('copy'))
        .send({ to: 'sent_back', note: 'x', version: 1 });
      expect(stale.status).toBe(409);
      expect((await detail(claim.id)).status).toBe('awaiting_signoff');
    });

    it('freezes the submitted version: it can no longer be edited', async () => {
      const { claim, sourceId, workingId } = await researchedClaim('Submitting freezes a version');
      const version = await completeDraft(claim.id, sourceId, workingId);
      expect((await move(claim.id, 'editor', 'awaiting_signoff')).status).toBe(200);
      const frozen = (await verdict(claim.id)).versions[0]!;
      expect(frozen).toMatchObject({ id: version.id, state: 'submitted' });
      const edit = await save(claim.id, frozen, 'editor', {
        bottomLine: 'Changed after submitting',
      });
      expect(edit.status).toBe(422);
      expect(edit.body.fields).toEqual({ state: 'submitted' });
    });

    it('keeps on the claim a working and a source a verdict uses: out of a draft first, for good once submitted', async () => {
      const { claim, sourceId, workingId } = await researchedClaim('What a verdict uses stays');
      const removeWorking = () =>
        t.http().delete(`/api/claims/${claim.id}/workings/${workingId}`).set(as('editor'));
      const unlinkSource = () =>
        t.http().delete(`/api/claims/${claim.id}/sources/${sourceId}`).set(as('editor'));
      const expectRefused = async (
        response: { status: number; body: { message: string; fields?: object } },
        field: 'working' | 'source',
        message: RegExp,
      ) => {
        expect(response.status).toBe(409);
        expect(response.body.fields).toEqual({ [field]: 'inUse' });
        expect(response.body.message).toMatch(message);
      };
      await completeDraft(claim.id, sourceId, workingId);
      await expectRefused(
        await removeWorking(),
        'working',
        /^The draft of version 1 .* uses this working/,
      );
      await expectRefused(
        await unlinkSource(),
        'source',
        /^The draft of version 1 .* uses this source/,
      );

      expect((await move(claim.id, 'editor', 'awaiting_signoff')).status).toBe(200);
      const kept =
        /^Version 1 of the verdict uses this \w+, and a version sent for sign-off is kept/;
      await expectRefused(await removeWorking(), 'working', kept);
      await expectRefused(await unlinkSource(), 'source', kept);
      const workings = await t.http().get(`/api/claims/${claim.id}/workings`).set(as('copy'));
      expect(workings.body.map((working: { id: string }) => working.id)).toEqual([workingId]);
      expect((await detail(claim.id)).sources.map((link) => link.id)).toEqual([sourceId]);

      // A working no version uses can still go.
      const spare = await t
        .http()
        .post(`/api/claims/${claim.id}/workings`)
        .set(as('editor'))
        .send({ calculatorId: 'energy-balance', inputs: {} })
        .expect(201);
      await t
        .http()
        .delete(`/api/claims/${claim.id}/workings/${spare.body.id}`)
        .set(as('editor'))
        .expect(204);
    });

    it('re-runs a working a submitted version uses without changing it, and says so', async () => {
      const { claim, sourceId, workingId } = await researchedClaim('A kept working is re-run');
      await completeDraft(claim.id, sourceId, workingId);
      expect((await move(claim.id, 'editor', 'awaiting_signoff')).status).toBe(200);
      // As if an older library had given another value.
      const workings = t.dataSource.getRepository(Working);
      const stored = await workings.findOneByOrFail({ id: workingId });
      const outputs = {
        ...stored.outputs,
        ratioToReference: { kind: 'number', value: 0.5, unit: '1' },
      };
      await workings.update(workingId, { libraryVersion: '0.0.1', outputs });
      const before = await workings.findOneByOrFail({ id: workingId });

      const response = await t
        .http()
        .post(`/api/claims/${claim.id}/workings/${workingId}/rerun`)
        .set(as('editor'))
        .send({ version: before.version });
      expect(response.status).toBe(200);
      const rerun = response.body as WorkingRerunResponse;
      expect(rerun).toMatchObject({ keptBy: 1, changed: true, previousLibraryVersion: '0.0.1' });
      expect(rerun.libraryVersion).not.toBe('0.0.1');
      expect(rerun.differences.map((difference) => difference.output)).toEqual([
        'ratioToReference',
      ]);
      // Stored as it was: what version 1 shows has not moved.
      const after = await workings.findOneByOrFail({ id: workingId });
      expect(after).toMatchObject({ version: before.version, libraryVersion: '0.0.1', outputs });
      expect(rerun.working.outputs).toEqual(outputs);
    });

    it('refuses to submit a verdict that is not written yet', async () => {
      const { claim } = await researchedClaim('An empty verdict cannot be submitted');
      expect((await move(claim.id, 'editor', 'awaiting_signoff')).body.fields).toEqual({
        verdict: 'required',
      });
      await draft(claim.id, 'editor');
      const incomplete = await move(claim.id, 'editor', 'awaiting_signoff');
      expect(incomplete.status).toBe(422);
      expect(incomplete.body.fields).toEqual({ verdict: 'incomplete' });
    });

    it('sends back with notes on the version, back into research, a new version, then clears', async () => {
      const { claim, sourceId, workingId } = await researchedClaim('Sent back, revised, cleared');
      await completeDraft(claim.id, sourceId, workingId);
      expect((await move(claim.id, 'editor', 'awaiting_signoff')).status).toBe(200);
      const noNote = await move(claim.id, 'copy', 'sent_back');
      expect(noNote.status).toBe(422);
      expect(noNote.body.fields).toEqual({ note: 'required' });
      const sentBack = await move(claim.id, 'copy', 'sent_back', {
        note: 'Say how sure the science is.',
      });
      expect(sentBack.status).toBe(200);
      expect(sentBack.body.status).toBe('sent_back');
      const [first] = (await verdict(claim.id)).versions;
      expect(first).toMatchObject({ number: 1, state: 'sent_back' });
      expect(first!.decisions).toEqual([
        expect.objectContaining({
          decision: 'sent_back',
          notes: 'Say how sure the science is.',
          by: expect.objectContaining({ id: ids.copy }),
        }),
      ]);

      const revised = await draft(claim.id, 'editor');
      expect(revised.status).toBe(201);
      expect(revised.body).toMatchObject({ number: 2, state: 'draft', ratingId: 'contradicted' });
      expect((await detail(claim.id)).status).toBe('in_research');
      const saved = await save(claim.id, revised.body, 'editor', {
        bottomLine: 'It is virtually certain (99–100 %) that the interior’s heat is far too small.',
      });
      expect(saved.status).toBe(200);
      expect((await move(claim.id, 'editor', 'awaiting_signoff')).status).toBe(200);

      const signoff = (
        await t.http().get(`/api/claims/${claim.id}/signoff`).set(as('copy')).expect(200)
      ).body as SignoffView;
      expect(signoff).toMatchObject({
        mayDecide: true,
        whyNot: null,
        version: { number: 2 },
        previous: { number: 1 },
      });
      expect(signoff.checklist.every((entry) => entry.done)).toBe(true);

      const cleared = await move(claim.id, 'copy', 'cleared');
      expect(cleared.status).toBe(200);
      expect(cleared.body.status).toBe('cleared');
      const events = await t.dataSource
        .getRepository(AuditEvent)
        .find({ where: { claimId: claim.id }, order: { at: 'ASC' } });
      expect(events.map((event) => event.action)).toEqual(
        expect.arrayContaining([
          'verdict.drafted',
          'claim.awaiting_signoff',
          'claim.sent_back',
          'claim.in_research',
          'claim.cleared',
        ]),
      );
    });

    it('never lets anyone clear a version they drafted or last edited, even through the API', async () => {
      const { claim, sourceId, workingId } = await researchedClaim('The two-person rule');
      // The desk chief drafts; the desk chief may not then clear it.
      await completeDraft(claim.id, sourceId, workingId, 'chief');
      expect((await move(claim.id, 'chief', 'awaiting_signoff')).status).toBe(200);
      const own = await move(claim.id, 'chief', 'cleared');
      expect(own.status).toBe(403);
      expect(own.body.message).toMatch(/drafted this version/);
      const ownSendBack = await move(claim.id, 'chief', 'sent_back', { note: 'Myself' });
      expect(ownSendBack.status).toBe(403);
      const view = (
        await t.http().get(`/api/claims/${claim.id}/signoff`).set(as('chief')).expect(200)
      ).body as SignoffView;
      expect(view).toMatchObject({ mayDecide: false, whyNot: expect.stringMatching(/drafted/) });

      // Another desk chief edits a draft last: they may not clear it either.
      expect((await move(claim.id, 'copy', 'sent_back', { note: 'Tighten it' })).status).toBe(200);
      const revised = (await draft(claim.id, 'chief')).body as VerdictVersionView;
      expect(
        (await save(claim.id, revised, 'chief2', { bottomLine: 'Edited by the second chief.' }))
          .status,
      ).toBe(200);
      expect((await move(claim.id, 'chief2', 'awaiting_signoff')).status).toBe(200);
      const lastEditor = await move(claim.id, 'chief2', 'cleared');
      expect(lastEditor.status).toBe(403);
      expect(lastEditor.body.message).toMatch(/edited this version last/);
      expect((await move(claim.id, 'copy', 'cleared')).status).toBe(200);
    });

    it('refuses to clear while a checklist item is open, naming it', async () => {
      const { claim, sourceId, workingId } = await researchedClaim(
        'Clearing needs the checklist done',
      );
      await t.dataSource.getRepository(Claim).update(claim.id, { legalReview: true });
      await completeDraft(claim.id, sourceId, workingId);
      expect((await move(claim.id, 'editor', 'awaiting_signoff')).status).toBe(200);
      const refused = await move(claim.id, 'copy', 'cleared');
      expect(refused.status).toBe(422);
      expect(refused.body.fields).toEqual({ 'checklist.legalReview': 'open' });
      expect(refused.body.message).toMatch(/legal-review flag cleared/);
      expect((await detail(claim.id)).status).toBe('awaiting_signoff');
    });

    it('counts a desk chief’s waiver of the right of reply, with its reason', async () => {
      const filed = await t
        .http()
        .post('/api/claims')
        .set(as('reporter'))
        .send({
          text: 'An anonymous leaflet says the sun is to blame.',
          summary: 'An anonymous leaflet blames the sun',
          topics: ['solar'],
          claimant: { name: 'Anonymous leaflet', kind: 'organisation' },
        });
      const claim = filed.body as ClaimDetail;
      await t
        .http()
        .post(`/api/claims/${claim.id}/assign`)
        .set(as('editor'))
        .send({ assigneeId: ids.editor, version: claim.version });
      const started = (await draft(claim.id, 'editor')).body as VerdictVersionView;
      await save(claim.id, started, 'editor', {
        ratingId: 'not-checkable',
        bottomLine: 'No author to ask.',
      });
      const before = (await t.http().get(`/api/claims/${claim.id}/signoff`).set(as('copy')))
        .body as SignoffView;
      expect(before.checklist.find((entry) => entry.key === 'rightOfReply')).toMatchObject({
        done: false,
      });
      const byEditor = await t
        .http()
        .put(`/api/claims/${claim.id}/reply-waiver`)
        .set(as('editor'))
        .send({ reason: 'x', version: 1 });
      expect(byEditor.status).toBe(403);
      const waived = await t
        .http()
        .put(`/api/claims/${claim.id}/reply-waiver`)
        .set(as('chief'))
        .send({
          reason: 'The leaflet has no author or address to reach',
          version: (await detail(claim.id)).version,
        });
      expect(waived.status).toBe(204);
      const after = (await t.http().get(`/api/claims/${claim.id}/signoff`).set(as('copy')))
        .body as SignoffView;
      expect(after.checklist.find((entry) => entry.key === 'rightOfReply')).toMatchObject({
        done: true,
        detail: expect.stringContaining('The leaflet has no author or address to reach'),
      });
    });
  });
});
