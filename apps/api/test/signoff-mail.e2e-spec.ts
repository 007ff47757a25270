import { type ClaimDetail, type ClaimStatus, type VerdictVersionView } from '@skyledger/contracts';
import { startApi } from '@skyledger/devstack/api-server';
import { freePort } from '@skyledger/devstack/free-port';
import { type ChildProcess } from 'node:child_process';
import { OutboxMessage } from '../src/mail/entities/outbox-message.entity';
import { OutboxWorker } from '../src/mail/outbox.worker';
import { HoldingSmtp } from './support/holding-smtp';
import { createTestApp, testPassword, type TestApp } from './support/test-app';

type Person = 'reporter' | 'editor' | 'copy' | 'copy2';

/**
 * The mails of the sign-off process and their delivery: each step mails the right
 * people, once, even when the relay is down or the API dies in the middle of sending.
 */
describe('sign-off mail, and mail that is never lost nor sent twice', () => {
  let t: TestApp;
  const tokens = {} as Record<Person, string>;
  const ids = {} as Record<Person, string>;
  const as = (person: Person) => ({ Authorization: `Bearer ${tokens[person]}` });
  const worker = () => t.app.get(OutboxWorker);
  const outbox = () => t.dataSource.getRepository(OutboxMessage);

  const detail = async (claimId: string) =>
    (await t.http().get(`/api/claims/${claimId}`).set(as('copy')).expect(200)).body as ClaimDetail;
  const move = async (claimId: string, who: Person, to: ClaimStatus, note?: string) => {
    const response = await t
      .http()
      .post(`/api/claims/${claimId}/transitions`)
      .set(as(who))
      .send({ to, note, version: (await detail(claimId)).version });
    expect({ to, status: response.status }).toEqual({ to, status: 200 });
  };

  /** A claim through research to a submitted verdict, with everything the checklist wants. */
  async function submittedClaim(summary: string): Promise<ClaimDetail> {
    const filed = await t
      .http()
      .post('/api/claims')
      .set(as('reporter'))
      .send({
        text: `${summary}, as said on the radio.`,
        summary,
        topics: ['solar'],
        claimant: { name: `Claimant of ${summary}`, kind: 'organisation' },
      });
    const claim = filed.body as ClaimDetail;
    await t
      .http()
      .post(`/api/claims/${claim.id}/assign`)
      .set(as('editor'))
      .send({ assigneeId: ids.editor, version: claim.version })
      .expect(200);
    const source = await t
      .http()
      .post(`/api/claims/${claim.id}/sources`)
      .set(as('editor'))
      .send({
        source: {
          title: 'Total solar irradiance satellite record (invented for the test)',
          publisher: 'Wenlow Regional Climate Service',
          url: 'https://wenlow-climate.test/tsi',
          kind: 'agency_dataset',
          grade: 'strong',
          gradeReason: 'The agency’s own record',
        },
      })
      .expect(201);
    await t
      .http()
      .post(`/api/claims/${claim.id}/reply-attempts`)
      .set(as('editor'))
      .send({
        contacted: 'The press office',
        contactedAt: '2026-11-30T10:00:00+00:00',
        channel: 'phone',
        outcome: 'declined',
      })
      .expect(201);
    const draft = (
      await t.http().post(`/api/claims/${claim.id}/verdict/versions`).set(as('editor')).send({})
    ).body as VerdictVersionView;
    await t
      .http()
      .patch(`/api/claims/${claim.id}/verdict/versions/${draft.id}`)
      .set(as('editor'))
      .send({
        version: draft.version,
        ratingId: 'contradicted',
        bottomLine: 'The sun’s output has not risen since satellites began measuring it.',
        primarySourceId: source.body.id,
      })
      .expect(200);
    await move(claim.id, 'editor', 'awaiting_signoff');
    return claim;
  }

  beforeAll(async () => {
    // The suite delivers mail itself: by worker passes here, or by a real API process.
    t = await createTestApp('signoff_mail', { OUTBOX_WORKER_ENABLED: 'false' });
    const roles = {
      reporter: 'reporter',
      editor: 'science_editor',
      copy: 'copy_desk',
      copy2: 'copy_desk',
    } as const;
    for (const [person, role] of Object.entries(roles) as Array<[Person, (typeof roles)[Person]]>) {
      const user = await t.addUser(role, `${person}@signoff-mail.test`);
      ids[person] = user.id;
      tokens[person] = (await t.signIn(user.email, testPassword)).accessToken;
    }
  });
  afterAll(() => t.close());

  it('mails the copy desk on submission, the author the notes when sent back, and the author when cleared', async () => {
    // The second copy editor turned sign-off requests off.
    await t
      .http()
      .put('/api/me/notifications')
      .set(as('copy2'))
      .send({ disabled: ['signoff_requested'] })
      .expect(200);
    const claim = await submittedClaim('The sun explains the warm summers');
    await worker().runPass();
    const request = await t.mail.waitFor(
      (mail) => mail.subject === `For sign-off: ${claim.summary}`,
    );
    expect(request.to).toEqual(['copy@signoff-mail.test']);
    expect(request.text).toContain(`/claims/${claim.id}/signoff`);

    await move(claim.id, 'copy', 'sent_back', 'Give the satellite record’s start year.');
    await worker().runPass();
    const sentBack = await t.mail.waitFor((mail) => mail.subject === `Sent back: ${claim.summary}`);
    expect(sentBack.to).toEqual(['editor@signoff-mail.test']);
    expect(sentBack.text).toContain('Give the satellite record’s start year.');

    const revised = (
      await t.http().post(`/api/claims/${claim.id}/verdict/versions`).set(as('editor')).send({})
    ).body as VerdictVersionView;
    expect(revised.number).toBe(2);
    await move(claim.id, 'editor', 'awaiting_signoff');
    await move(claim.id, 'copy', 'cleared');
    await worker().runPass();
    const cleared = await t.mail.waitFor((mail) => mail.subject === `Cleared: ${claim.summary}`);
    expect(cleared.to).toEqual(['editor@signoff-mail.test']);
    expect(t.mail.messages.filter((mail) => mail.to.includes('copy2@signoff-mail.test'))).toEqual(
      [],
    );

    const settings = await t.http().get('/api/me/notifications').set(as('copy2')).expect(200);
    expect(settings.body.kinds).toContainEqual(
      expect.objectContaining({ kind: 'signoff_requested', enabled: false }),
    );
    const bad = await t
      .http()
      .put('/api/me/notifications')
      .set(as('copy2'))
      .send({ disabled: ['everything'] });
    expect(bad.status).toBe(400);
    expect(Object.keys(bad.body.fields)).toEqual(['disabled']);
  });

  it('keeps moves working while the relay is down, then delivers each mail exactly once after the API is killed mid-send', async () => {
    await t
      .http()
      .put('/api/me/notifications')
      .set(as('copy2'))
      .send({ disabled: ['signoff_requested'] })
      .expect(200);
    await t.mail.stop();
    const claims = [
      await submittedClaim('Volcanoes out-emit people'),
      await submittedClaim('Cosmic rays drive the climate'),
    ];
    await move(claims[0]!.id, 'copy', 'sent_back', 'Cite the emission estimate.');
    await worker().runPass();
    const waiting = await outbox().findBy({ state: 'pending' });
    expect(waiting.length).toBe(3);
    expect(waiting.every((message) => /ECONNREFUSED|connect/i.test(message.lastError ?? ''))).toBe(
      true,
    );

    const relay = await new HoldingSmtp().start();
    relay.holding = true;
    await t.dataSource.query(
      "UPDATE outbox_messages SET next_attempt_at = NOW(3) WHERE state = 'pending'",
    );
    const env = {
      ...(process.env as Record<string, string>),
      NODE_ENV: 'test',
      LOG_LEVEL: 'silent',
      SMTP_PORT: String(relay.port),
      OUTBOX_WORKER_ENABLED: 'true',
      OUTBOX_POLL_MS: '100',
      OUTBOX_STALE_SECONDS: '5',
    };
    let api: ChildProcess | undefined = await startApi(env, await freePort(), true);
    try {
      await relay.until(() => relay.held >= 1);
      process.kill(-api.pid!, 'SIGKILL');
      await new Promise((resolve) => api!.once('exit', resolve));
      api = undefined;
      expect(relay.accepted).toEqual([]);
      expect((await outbox().findBy({ state: 'sending' })).length).toBeGreaterThanOrEqual(1);

      relay.holding = false;
      api = await startApi(env, await freePort(), true);
      await relay.until(() => relay.accepted.length >= 3);
      // Give a late duplicate every chance to arrive before counting.
      await new Promise((resolve) => setTimeout(resolve, 1500));
    } finally {
      if (api) process.kill(-api.pid!, 'SIGKILL');
      await relay.stop();
    }
    const delivered = relay.accepted.map((mail) => `${mail.to} | ${mail.subject}`).sort();
    expect(delivered).toEqual(
      [
        `copy@signoff-mail.test | For sign-off: ${claims[0]!.summary}`,
        `copy@signoff-mail.test | For sign-off: ${claims[1]!.summary}`,
        `editor@signoff-mail.test | Sent back: ${claims[0]!.summary}`,
      ].sort(),
    );
    expect(await outbox().countBy({ state: 'sent' })).toBe(await outbox().count());
    // Two API starts and a wait for the stale claim to lapse.
  }, 120_000);
});
