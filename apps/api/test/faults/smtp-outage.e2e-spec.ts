import { MailCatcher } from '../support/mail-catcher';
import { createTestApp, testPassword, type TestApp } from '../support/test-app';

const MAILS = 30;

/**
 * The mail relay goes away for a while with the outbox worker running on its own: every
 * mail written meanwhile waits in the outbox and, once the relay is back, reaches its
 * recipient exactly once.
 */
describe('the SMTP relay is down for a while', () => {
  let t: TestApp;
  let chiefToken: string;

  beforeAll(async () => {
    t = await createTestApp('smtp_outage', { OUTBOX_POLL_MS: '100', PUBLISHER_ENABLED: 'false' });
    await t.addUser('desk_chief', 'chief@smtp-outage.test');
    chiefToken = (await t.signIn('chief@smtp-outage.test', testPassword)).accessToken;
  });
  afterAll(() => t.close());

  const outbox = async () =>
    (await t.dataSource.query(
      "SELECT to_address AS address, state, attempts FROM outbox_messages WHERE to_address LIKE '%@outage.test'",
    )) as Array<{ address: string; state: string; attempts: number }>;

  it('delivers every mail written during the outage exactly once when the relay is back', async () => {
    const port = t.mail.port;
    await t.mail.stop();

    const addresses = Array.from({ length: MAILS }, (_, i) => `invitee-${i}@outage.test`);
    for (const [i, email] of addresses.entries()) {
      await t
        .http()
        .post('/api/users/invitations')
        .set('Authorization', `Bearer ${chiefToken}`)
        .send({ email, displayName: `Invitee ${i}`, role: 'reporter' })
        .expect(201);
    }
    // Every mail has been tried against the missing relay at least once.
    const deadline = Date.now() + 15_000;
    while ((await outbox()).some((row) => row.attempts < 1) && Date.now() < deadline) {
      await new Promise((resolve) => setTimeout(resolve, 100));
    }
    const during = await outbox();
    expect(during).toHaveLength(MAILS);
    expect(during.every((row) => row.state === 'pending' && row.attempts >= 1)).toBe(true);
    const failedAttempts = during.reduce((sum, row) => sum + row.attempts, 0);

    const back = await new MailCatcher().start(port);
    try {
      // The worker's own backoff brings each mail round again; nothing here nudges it.
      for (const address of addresses) {
        await back.waitFor((mail) => mail.to.includes(address), 60_000);
      }
      // A few more passes of the worker: nothing already sent goes out again.
      await new Promise((resolve) => setTimeout(resolve, 1_000));
      const counts = addresses.map((address) => back.to(address).length);
      const after = await outbox();
      const lost = counts.filter((count) => count === 0).length;
      const duplicates = counts.reduce((sum, count) => sum + Math.max(0, count - 1), 0);
      console.info(
        `SMTP outage: ${MAILS} mails written while the relay was down, ${failedAttempts} attempts refused; ` +
          `after it came back ${MAILS - lost} delivered, duplicates ${duplicates}, mails lost ${lost}`,
      );
      expect({ lost, duplicates }).toEqual({ lost: 0, duplicates: 0 });
      expect(after.every((row) => row.state === 'sent')).toBe(true);
    } finally {
      await back.stop();
    }
  }, 90_000);
});
