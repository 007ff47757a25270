import { freePort } from '@skyledger/devstack/free-port';
import { spawn, type ChildProcess } from 'node:child_process';
import { createHmac } from 'node:crypto';
import { join } from 'node:path';
import { refreshCookieOf } from './support/test-app';
import { createTestApp, testPassword, type TestApp } from './support/test-app';

const base64url = (value: object) => Buffer.from(JSON.stringify(value)).toString('base64url');

/** A JWT with the given header and payload, signed (HS256) with `key`, or unsigned. */
function token(header: object, payload: object, key?: string): string {
  const unsigned = `${base64url(header)}.${base64url(payload)}`;
  if (!key) return `${unsigned}.`;
  return `${unsigned}.${createHmac('sha256', key).update(unsigned).digest('base64url')}`;
}

describe('sign-in hardening: forged tokens, cookies, and passwords kept out of logs', () => {
  let t: TestApp;
  let user: { id: string; email: string };

  beforeAll(async () => {
    t = await createTestApp('auth_hardening', { OUTBOX_WORKER_ENABLED: 'false' });
    user = await t.addUser('desk_chief', 'chief@hardening.test');
  });
  afterAll(() => t.close());

  it('refuses tokens with alg none, a wrong key, a past expiry or an unknown person', async () => {
    const now = Math.floor(Date.now() / 1000);
    const claims = { sub: user.id, iat: now, exp: now + 600 };
    const forged = [
      token({ alg: 'none', typ: 'JWT' }, claims),
      token({ alg: 'HS256', typ: 'JWT' }, claims, 'not the secret, but long enough to look real'),
      token({ alg: 'HS256', typ: 'JWT' }, { ...claims, exp: now - 60 }, process.env.JWT_SECRET),
      token(
        { alg: 'HS256', typ: 'JWT' },
        { ...claims, sub: '3f1c6f0e-8a4b-4c4e-9d7e-2b1a0c9d8e7f' },
        process.env.JWT_SECRET,
      ),
      token({ alg: 'HS512', typ: 'JWT' }, claims, process.env.JWT_SECRET),
    ];
    for (const jwt of forged) {
      const response = await t.http().get('/api/users').set('Authorization', `Bearer ${jwt}`);
      expect({ jwt: jwt.slice(0, 24), status: response.status }).toEqual({
        jwt: jwt.slice(0, 24),
        status: 401,
      });
    }
    // The same claims signed with the API's own key pass: the refusals above are the forgery's.
    const genuine = token({ alg: 'HS256', typ: 'JWT' }, claims, process.env.JWT_SECRET);
    expect(
      (await t.http().get('/api/users').set('Authorization', `Bearer ${genuine}`)).status,
    ).toBe(200);
  });

  it('sets the refresh cookie HttpOnly, SameSite=Strict and scoped to the auth routes', async () => {
    const response = await t
      .http()
      .post('/api/auth/sign-in')
      .send({ email: user.email, password: testPassword })
      .expect(200);
    const cookie = ([] as string[])
      .concat(response.headers['set-cookie'] ?? [])
      .find((c) => c.startsWith('skyledger_refresh='))!;
    expect(cookie).toMatch(/HttpOnly/);
    expect(cookie).toMatch(/SameSite=Strict/);
    expect(cookie).toMatch(/Path=\/api\/auth/);
    // Local development (NODE_ENV=test here): not Secure, so http://127.0.0.1 works.
    expect(cookie).not.toMatch(/Secure/);
    expect(refreshCookieOf(response)).toMatch(/^skyledger_refresh=/);
  });
});

describe('a production API process', () => {
  let t: TestApp;
  let api: ChildProcess;
  let output = '';
  let port: number;
  const secretPassword = 'Zebra-Quartz-Lantern-4471';

  beforeAll(async () => {
    t = await createTestApp('auth_hardening_prod', { OUTBOX_WORKER_ENABLED: 'false' });
    await t.addUser('reporter', 'reporter@hardening.test', secretPassword);
    port = await freePort();
    api = spawn(process.execPath, [join(__dirname, '../dist/main.js')], {
      env: {
        ...process.env,
        NODE_ENV: 'production',
        LOG_LEVEL: 'trace',
        PORT: String(port),
        HOST: '127.0.0.1',
        OUTBOX_WORKER_ENABLED: 'false',
        PUBLISHER_ENABLED: 'false',
      },
      stdio: ['ignore', 'pipe', 'pipe'],
      detached: true,
    });
    api.stdout!.on('data', (chunk: Buffer) => (output += chunk.toString()));
    api.stderr!.on('data', (chunk: Buffer) => (output += chunk.toString()));
    for (let tries = 0; tries < 300; tries += 1) {
      try {
        if ((await fetch(`http://127.0.0.1:${port}/api/health`)).ok) return;
      } catch {
        // not up yet
      }
      await new Promise((resolve) => setTimeout(resolve, 100));
    }
    throw new Error(`the API did not start:\n${output}`);
  }, 60_000);
  afterAll(async () => {
    if (api.pid) process.kill(-api.pid, 'SIGKILL');
    await t.close();
  });

  it('marks the refresh cookie Secure, and never writes a password to its logs', async () => {
    const url = `http://127.0.0.1:${port}/api/auth/sign-in`;
    const post = (body: object) =>
      fetch(url, {
        method: 'POST',
        headers: { 'Content-Type': 'application/json' },
        body: JSON.stringify(body),
      });
    const good = await post({ email: 'reporter@hardening.test', password: secretPassword });
    expect(good.status).toBe(200);
    expect(good.headers.get('set-cookie')).toMatch(/; Secure/);
    expect(
      (await post({ email: 'reporter@hardening.test', password: `${secretPassword}-wrong` }))
        .status,
    ).toBe(401);
    expect((await post({ email: 'reporter@hardening.test', password: 7 })).status).toBe(400);
    await new Promise((resolve) => setTimeout(resolve, 500));
    expect(output).toContain('/api/auth/sign-in');
    expect(output).not.toContain(secretPassword);
    expect(output).not.toMatch(/"authorization"\s*:\s*"Bearer/i);
  });
});
