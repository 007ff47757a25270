import { createTestApp, refreshCookieOf, testPassword, type TestApp } from './support/test-app';

describe('sign-in, sessions and lockout', () => {
  let t: TestApp;
  const editor = 'editor@auth.test';

  beforeAll(async () => {
    // No grace: a replayed refresh token is treated as stolen at once. The desk's zone and
    // name are this suite's own, so the session and /api/me are seen to read them.
    t = await createTestApp('auth', {
      REFRESH_REUSE_GRACE_SECONDS: '0',
      LOCKOUT_THRESHOLD: '5',
      DESK_TIME_ZONE: 'Pacific/Auckland',
      NEWSROOM_NAME: 'Auth Suite Courier',
    });
    await t.addUser('science_editor', editor);
  });
  afterAll(() => t.close());

  it('signs in with the right password and sets a strict, httpOnly refresh cookie', async () => {
    const response = await t
      .http()
      .post('/api/auth/sign-in')
      .send({ email: 'Editor@Auth.test ', password: testPassword });
    expect(response.status).toBe(200);
    expect(response.body).toMatchObject({
      expiresIn: 900,
      user: {
        email: editor,
        role: 'science_editor',
        status: 'active',
        deskTimeZone: 'Pacific/Auckland',
        newsroomName: 'Auth Suite Courier',
      },
    });
    expect(typeof response.body.accessToken).toBe('string');
    const cookie = ([] as string[])
      .concat(response.headers['set-cookie'] ?? [])
      .find((c) => c.startsWith('skyledger_refresh='));
    expect(cookie).toMatch(/HttpOnly/);
    expect(cookie).toMatch(/SameSite=Strict/);
    expect(cookie).toMatch(/Path=\/api\/auth/);

    const me = await t
      .http()
      .get('/api/me')
      .set('Authorization', `Bearer ${response.body.accessToken}`);
    expect(me.status).toBe(200);
    expect(me.body).toEqual({
      id: expect.any(String),
      email: editor,
      displayName: 'editor',
      role: 'science_editor',
      status: 'active',
      deskTimeZone: 'Pacific/Auckland',
      newsroomName: 'Auth Suite Courier',
    });
  });

  it('answers a wrong password and an unknown e-mail alike', async () => {
    const wrong = await t
      .http()
      .post('/api/auth/sign-in')
      .send({ email: editor, password: 'not the password' });
    const unknown = await t
      .http()
      .post('/api/auth/sign-in')
      .send({ email: 'nobody@auth.test', password: 'whatever' });
    expect(wrong.status).toBe(401);
    expect(unknown.status).toBe(401);
    expect(wrong.body).toEqual({
      statusCode: 401,
      error: 'Unauthorized',
      message: 'E-mail or password is wrong',
    });
    expect(unknown.body).toEqual(wrong.body);
    // A successful sign-in clears the count, so this failure does not add to the lockout test below.
    await t.signIn(editor, testPassword);
  });

  it('refuses calls without a valid access token', async () => {
    const none = await t.http().get('/api/me');
    expect(none.status).toBe(401);
    expect(none.body).toMatchObject({ statusCode: 401, error: 'Unauthorized' });
    const forged = await t.http().get('/api/me').set('Authorization', 'Bearer abc.def.ghi');
    expect(forged.status).toBe(401);
  });

  it('names each broken field and its rule', async () => {
    const response = await t
      .http()
      .post('/api/auth/sign-in')
      .send({ email: 'not-an-email', password: '', extra: 1 });
    expect(response.status).toBe(400);
    expect(response.body).toMatchObject({
      statusCode: 400,
      error: 'Bad Request',
      fields: { email: 'isEmail', password: 'isNotEmpty', extra: 'notAllowed' },
    });
    expect(response.body.message).toContain('email must be an e-mail address');
  });

  it('answers a body that is not JSON with a 400 in the same shape', async () => {
    const response = await t
      .http()
      .post('/api/auth/sign-in')
      .set('Content-Type', 'application/json')
      .send('{"email":');
    expect(response.status).toBe(400);
    expect(response.body).toEqual({
      statusCode: 400,
      error: 'Bad Request',
      message: 'The request body is not valid JSON',
    });
  });

  it('rotates the refresh token, and a replayed one revokes the whole session', async () => {
    const session = await t.signIn(editor, testPassword);
    const first = await t.http().post('/api/auth/refresh').set('Cookie', session.cookie);
    expect(first.status).toBe(200);
    const rotated = refreshCookieOf(first);
    expect(rotated).not.toEqual(session.cookie);
    expect(first.body.user.email).toBe(editor);

    const second = await t.http().post('/api/auth/refresh').set('Cookie', rotated);
    expect(second.status).toBe(200);
    const newest = refreshCookieOf(second);

    // The first cookie again: theft. The family dies, the newest cookie with it.
    const replay = await t.http().post('/api/auth/refresh').set('Cookie', session.cookie);
    expect(replay.status).toBe(401);
    const afterReplay = await t.http().post('/api/auth/refresh').set('Cookie', newest);
    expect(afterReplay.status).toBe(401);

    const [event] = await t.dataSource.query(
      "SELECT action FROM audit_events WHERE action = 'session.refresh_token_reused' LIMIT 1",
    );
    expect(event).toEqual({ action: 'session.refresh_token_reused' });
  });

  it('keeps other sessions alive when one is replayed', async () => {
    const laptop = await t.signIn(editor, testPassword);
    const phone = await t.signIn(editor, testPassword);
    await t.http().post('/api/auth/refresh').set('Cookie', laptop.cookie).expect(200);
    await t.http().post('/api/auth/refresh').set('Cookie', laptop.cookie).expect(401);
    await t.http().post('/api/auth/refresh').set('Cookie', phone.cookie).expect(200);
  });

  it('signs out: the refresh cookie stops working', async () => {
    const session = await t.signIn(editor, testPassword);
    await t.http().post('/api/auth/sign-out').set('Cookie', session.cookie).expect(204);
    await t.http().post('/api/auth/refresh').set('Cookie', session.cookie).expect(401);
  });

  it('refuses a refresh without a cookie', async () => {
    const response = await t.http().post('/api/auth/refresh');
    expect(response.status).toBe(401);
    expect(response.body.message).toBe('Not signed in');
  });

  it('locks the account after five failures, even against the right password', async () => {
    const victim = await t.addUser('reporter', 'locked@auth.test');
    for (let attempt = 1; attempt <= 4; attempt++) {
      await t
        .http()
        .post('/api/auth/sign-in')
        .send({ email: victim.email, password: 'guess ' + attempt })
        .expect(401);
    }
    const fifth = await t
      .http()
      .post('/api/auth/sign-in')
      .send({ email: victim.email, password: 'guess 5' });
    expect(fifth.status).toBe(423);
    expect(fifth.body.message).toMatch(/locked .* until \d\d:\d\d UTC/);

    const right = await t
      .http()
      .post('/api/auth/sign-in')
      .send({ email: victim.email, password: victim.password });
    expect(right.status).toBe(423);

    const [row] = await t.dataSource.query(
      "SELECT COUNT(*) AS n FROM audit_events WHERE action = 'user.locked' AND entity_id = ?",
      [victim.id],
    );
    expect(Number(row.n)).toBe(1);

    // When the lock has run out, the right password works again.
    await t.dataSource.query(
      'UPDATE users SET locked_until = NOW(3) - INTERVAL 1 SECOND WHERE id = ?',
      [victim.id],
    );
    await t.signIn(victim.email, victim.password);
  });

  it("ends a disabled person's access at once", async () => {
    const chief = await t.addUser('desk_chief', 'chief@auth.test');
    const leaver = await t.addUser('reporter', 'leaver@auth.test');
    const chiefSession = await t.signIn(chief.email, chief.password);
    const leaverSession = await t.signIn(leaver.email, leaver.password);
    await t
      .http()
      .get('/api/me')
      .set('Authorization', `Bearer ${leaverSession.accessToken}`)
      .expect(200);

    const list = await t
      .http()
      .get('/api/users')
      .set('Authorization', `Bearer ${chiefSession.accessToken}`)
      .expect(200);
    const version = list.body.items.find((u: { id: string }) => u.id === leaver.id).version;
    await t
      .http()
      .patch(`/api/users/${leaver.id}`)
      .set('Authorization', `Bearer ${chiefSession.accessToken}`)
      .send({ status: 'disabled', version })
      .expect(200);

    await t
      .http()
      .get('/api/me')
      .set('Authorization', `Bearer ${leaverSession.accessToken}`)
      .expect(401);
    await t.http().post('/api/auth/refresh').set('Cookie', leaverSession.cookie).expect(401);
    const again = await t
      .http()
      .post('/api/auth/sign-in')
      .send({ email: leaver.email, password: leaver.password });
    expect(again.status).toBe(403);
    expect(again.body.message).toMatch(/disabled/);
  });
});
