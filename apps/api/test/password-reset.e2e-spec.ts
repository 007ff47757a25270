import { OutboxWorker as OutboxWorkerToken } from '../src/mail/outbox.worker';
import { linkIn } from './support/mail-catcher';
import { createTestApp, testPassword, type TestApp } from './support/test-app';

describe('password reset by e-mail', () => {
  let t: TestApp;
  const email = 'forgetful@reset.test';

  beforeAll(async () => {
    t = await createTestApp('reset');
    await t.addUser('reporter', email);
  });
  afterAll(() => t.close());

  it('answers 202 for an unknown address and sends nothing', async () => {
    await t
      .http()
      .post('/api/auth/password-reset/request')
      .send({ email: 'nobody@reset.test' })
      .expect(202);
    await t.app.get(OutboxWorkerToken).runPass();
    expect(t.mail.to('nobody@reset.test')).toHaveLength(0);
  });

  it('mails a link that sets a new password once and ends the old sessions', async () => {
    const before = await t.signIn(email, testPassword);
    await t
      .http()
      .post('/api/auth/password-reset/request')
      .send({ email: 'Forgetful@Reset.test' })
      .expect(202);
    const mail = await t.mail.waitFor((m) => m.to.includes(email));
    expect(mail.subject).toBe('Reset your Skyledger password');
    const token = linkIn(mail, '/reset-password').searchParams.get('token')!;

    await t
      .http()
      .post('/api/auth/password-reset')
      .send({ token, password: 'a brand new passphrase' })
      .expect(204);
    await t.http().post('/api/auth/sign-in').send({ email, password: testPassword }).expect(401);
    await t.signIn(email, 'a brand new passphrase');
    await t.http().post('/api/auth/refresh').set('Cookie', before.cookie).expect(401);

    const reused = await t
      .http()
      .post('/api/auth/password-reset')
      .send({ token, password: 'yet another passphrase' });
    expect(reused.status).toBe(404);
  });

  it('refuses an expired link with 410', async () => {
    await t.http().post('/api/auth/password-reset/request').send({ email }).expect(202);
    await t.mail.waitFor((m) => m.to.includes(email) && t.mail.to(email).length >= 2);
    const token = linkIn(t.mail.to(email)[1]!, '/reset-password').searchParams.get('token')!;
    await t.dataSource.query(
      "UPDATE one_time_tokens SET expires_at = NOW(3) - INTERVAL 1 SECOND WHERE purpose = 'password_reset'",
    );
    const response = await t
      .http()
      .post('/api/auth/password-reset')
      .send({ token, password: 'too late passphrase' });
    expect(response.status).toBe(410);
    expect(response.body.fields).toEqual({ token: 'expired' });
  });
});
