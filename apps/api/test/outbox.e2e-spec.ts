import { OutboxWorker } from '../src/mail/outbox.worker';
import { MailCatcher } from './support/mail-catcher';
import { createTestApp, testPassword, type TestApp } from './support/test-app';

describe('the mail outbox', () => {
  let t: TestApp;
  let chiefToken: string;

  beforeAll(async () => {
    // The suite drives the worker's passes itself, so it knows when each has run.
    t = await createTestApp('outbox', { OUTBOX_WORKER_ENABLED: 'false' });
    await t.addUser('desk_chief', 'chief@outbox.test');
    chiefToken = (await t.signIn('chief@outbox.test', testPassword)).accessToken;
  });
  afterAll(() => t.close());

  const states = async (address: string) =>
    (await t.dataSource.query(
      'SELECT state, attempts, last_error FROM outbox_messages WHERE to_address = ?',
      [address],
    )) as Array<{
      state: string;
      attempts: number;
      last_error: string | null;
    }>;

  it('keeps mail while SMTP is down and delivers it exactly once when it is back', async () => {
    const port = t.mail.port;
    await t.mail.stop();

    await t
      .http()
      .post('/api/users/invitations')
      .set('Authorization', `Bearer ${chiefToken}`)
      .send({ email: 'patient@outbox.test', displayName: 'Patient Person', role: 'reporter' })
      .expect(201);

    const worker = t.app.get(OutboxWorker);
    await worker.runPass();
    const [waiting] = await states('patient@outbox.test');
    expect(waiting).toMatchObject({ state: 'pending' });
    expect(waiting!.attempts).toBeGreaterThanOrEqual(1);
    expect(waiting!.last_error).toMatch(/ECONNREFUSED|connect/i);

    const back = await new MailCatcher().start(port);
    try {
      await t.dataSource.query(
        "UPDATE outbox_messages SET next_attempt_at = NOW(3) WHERE state = 'pending'",
      );
      await worker.runPass();
      await back.waitFor((mail) => mail.to.includes('patient@outbox.test'));
      await worker.runPass();
      expect(back.to('patient@outbox.test')).toHaveLength(1);
      const [sent] = await states('patient@outbox.test');
      expect(sent).toMatchObject({ state: 'sent', last_error: null });
    } finally {
      await back.stop();
    }
  });

  it('writes no mail when the change it belongs to fails', async () => {
    const before = (await t.dataSource.query('SELECT COUNT(*) AS n FROM outbox_messages'))[0].n;
    await t
      .http()
      .post('/api/users/invitations')
      .set('Authorization', `Bearer ${chiefToken}`)
      .send({ email: 'chief@outbox.test', displayName: 'Duplicate', role: 'reporter' })
      .expect(409);
    const after = (await t.dataSource.query('SELECT COUNT(*) AS n FROM outbox_messages'))[0].n;
    expect(Number(after)).toBe(Number(before));
  });

  it('puts rows left `sending` by a crashed process back in the queue', async () => {
    await t.dataSource.query(
      `INSERT INTO outbox_messages (id, kind, to_address, subject, text_body, state, claim_id, claimed_at)
       VALUES (UUID(), 'test', 'orphan@outbox.test', 'Orphan', 'left behind', 'sending', UUID(), NOW(3) - INTERVAL 1 HOUR)`,
    );
    await t.app.get(OutboxWorker).runPass();
    const [row] = await states('orphan@outbox.test');
    // Delivered or waiting for its retry: either way it is no longer stuck.
    expect(row!.state).not.toBe('sending');
  });
});
