import { roles, type Role, type UserListItem } from '@skyledger/contracts';
import { linkIn } from './support/mail-catcher';
import { createTestApp, testPassword, type TestApp } from './support/test-app';

describe('people and roles', () => {
  let t: TestApp;
  const tokens: Partial<Record<Role, string>> = {};
  let chiefId: string;

  const as = (role: Role) => ({ Authorization: `Bearer ${tokens[role]}` });
  const listUsers = async (query = '') =>
    (await t.http().get(`/api/users${query}`).set(as('desk_chief')).expect(200)).body
      .items as UserListItem[];
  const userByEmail = async (email: string) =>
    (await listUsers()).find((user) => user.email === email)!;

  beforeAll(async () => {
    t = await createTestApp('users');
    for (const role of roles) {
      const user = await t.addUser(role, `${role.replace('_', '-')}@users.test`);
      if (role === 'desk_chief') chiefId = user.id;
      tokens[role] = (await t.signIn(user.email, testPassword)).accessToken;
    }
  });
  afterAll(() => t.close());

  it.each(['reporter', 'science_editor', 'copy_desk'] as const)(
    'refuses the People API to a %s (403)',
    async (role) => {
      const list = await t.http().get('/api/users').set(as(role));
      expect(list.status).toBe(403);
      expect(list.body).toEqual({
        statusCode: 403,
        error: 'Forbidden',
        message: 'Only desk chief may do this',
      });
      const invite = await t
        .http()
        .post('/api/users/invitations')
        .set(as(role))
        .send({ email: 'x@users.test', displayName: 'X', role: 'reporter' });
      expect(invite.status).toBe(403);
      const patch = await t
        .http()
        .patch(`/api/users/${chiefId}`)
        .set(as(role))
        .send({ role: 'reporter', version: 1 });
      expect(patch.status).toBe(403);
    },
  );

  it('lists people for the desk chief, sorted as asked', async () => {
    const byEmailDesc = await listUsers('?sort=email&order=desc');
    const emails = byEmailDesc.map((user) => user.email);
    expect(emails).toEqual([...emails].sort().reverse());
    expect(emails).toContain('desk-chief@users.test');
    const bad = await t.http().get('/api/users?sort=password').set(as('desk_chief'));
    expect(bad.status).toBe(400);
    expect(bad.body.fields).toEqual({ sort: 'isIn' });
  });

  it('invites by e-mail; the link shows the invitation and sets a password once', async () => {
    const invited = await t.http().post('/api/users/invitations').set(as('desk_chief')).send({
      email: 'New.Editor@Users.test',
      displayName: 'Noor Halloway',
      role: 'science_editor',
    });
    expect(invited.status).toBe(201);
    expect(invited.body).toMatchObject({
      email: 'new.editor@users.test',
      status: 'invited',
      role: 'science_editor',
    });

    const mail = await t.mail.waitFor((m) => m.to.includes('new.editor@users.test'));
    expect(mail.subject).toBe('You are invited to the Skyledger desk');
    expect(mail.text).toContain('as science editor');
    const link = linkIn(mail, '/accept-invite');
    expect(link.origin).toBe('http://127.0.0.1:3000');
    const token = link.searchParams.get('token')!;

    const info = await t.http().get(`/api/auth/invitations/${token}`).expect(200);
    expect(info.body).toMatchObject({
      email: 'new.editor@users.test',
      displayName: 'Noor Halloway',
      role: 'science_editor',
    });

    const short = await t
      .http()
      .post('/api/auth/invitations/accept')
      .send({ token, password: 'short' });
    expect(short.status).toBe(400);
    expect(short.body.fields).toEqual({ password: 'minLength' });

    await t
      .http()
      .post('/api/auth/invitations/accept')
      .send({ token, password: 'a long new password' })
      .expect(204);
    const session = await t.signIn('new.editor@users.test', 'a long new password');
    expect(session.body.user.status).toBe('active');

    const again = await t
      .http()
      .post('/api/auth/invitations/accept')
      .send({ token, password: 'another long password' });
    expect(again.status).toBe(404);
    expect(again.body.fields).toEqual({ token: 'unknown' });
  });

  it('refuses a second person with the same e-mail (409, field named)', async () => {
    const response = await t
      .http()
      .post('/api/users/invitations')
      .set(as('desk_chief'))
      .send({ email: 'REPORTER@users.test', displayName: 'Twin', role: 'reporter' });
    expect(response.status).toBe(409);
    expect(response.body.fields).toEqual({ email: 'taken' });
  });

  it('validates the invitation body field by field', async () => {
    const response = await t
      .http()
      .post('/api/users/invitations')
      .set(as('desk_chief'))
      .send({ email: 'nope', displayName: '   ', role: 'editor-in-chief' });
    expect(response.status).toBe(400);
    expect(response.body.fields).toEqual({
      email: 'isEmail',
      displayName: 'isNotEmpty',
      role: 'isIn',
    });
  });

  it('a resent invitation retires the earlier link; an expired link says so (410)', async () => {
    const invited = await t
      .http()
      .post('/api/users/invitations')
      .set(as('desk_chief'))
      .send({ email: 'late@users.test', displayName: 'Late Comer', role: 'reporter' })
      .expect(201);
    const first = linkIn(
      await t.mail.waitFor((m) => m.to.includes('late@users.test')),
      '/accept-invite',
    );
    await t
      .http()
      .post(`/api/users/${invited.body.id}/invitation`)
      .set(as('desk_chief'))
      .expect(202);
    await t.mail.waitFor((m) => m.to.includes('late@users.test') && !m.text.includes(first.search));
    await t
      .http()
      .get(`/api/auth/invitations/${first.searchParams.get('token')}`)
      .expect(404);

    const second = linkIn(t.mail.to('late@users.test')[1]!, '/accept-invite').searchParams.get(
      'token',
    )!;
    await t.dataSource.query(
      'UPDATE one_time_tokens SET expires_at = NOW(3) - INTERVAL 1 MINUTE WHERE user_id = ? AND used_at IS NULL',
      [invited.body.id],
    );
    const expired = await t.http().get(`/api/auth/invitations/${second}`);
    expect(expired.status).toBe(410);
    expect(expired.body.message).toMatch(/expired/);
  });

  it('changes a role with the current version; a stale version is a 409 and changes nothing', async () => {
    const target = await userByEmail('copy-desk@users.test');
    const changed = await t
      .http()
      .patch(`/api/users/${target.id}`)
      .set(as('desk_chief'))
      .send({ role: 'science_editor', version: target.version });
    expect(changed.status).toBe(200);
    expect(changed.body).toMatchObject({ role: 'science_editor', version: target.version + 1 });

    const stale = await t
      .http()
      .patch(`/api/users/${target.id}`)
      .set(as('desk_chief'))
      .send({ displayName: 'Overwritten', version: target.version });
    expect(stale.status).toBe(409);
    expect(stale.body.fields).toEqual({ version: 'stale' });
    expect((await userByEmail('copy-desk@users.test')).displayName).toBe('copy-desk');

    const [audit] = await t.dataSource.query(
      "SELECT summary FROM audit_events WHERE action = 'user.updated' AND entity_id = ? ORDER BY at DESC LIMIT 1",
      [target.id],
    );
    const summary = typeof audit.summary === 'string' ? JSON.parse(audit.summary) : audit.summary;
    expect(summary).toEqual({ role: { from: 'copy_desk', to: 'science_editor' } });

    // The new role holds from the very next request.
    const copyToken = tokens.copy_desk!;
    const me = await t
      .http()
      .get('/api/me')
      .set('Authorization', `Bearer ${copyToken}`)
      .expect(200);
    expect(me.body.role).toBe('science_editor');
  });

  it('keeps at least one active desk chief, and nobody disables themself', async () => {
    const chief = await userByEmail('desk-chief@users.test');
    const demote = await t
      .http()
      .patch(`/api/users/${chief.id}`)
      .set(as('desk_chief'))
      .send({ role: 'reporter', version: chief.version });
    expect(demote.status).toBe(422);
    expect(demote.body.fields).toEqual({ role: 'lastDeskChief' });

    const disableSelf = await t
      .http()
      .patch(`/api/users/${chief.id}`)
      .set(as('desk_chief'))
      .send({ status: 'disabled', version: chief.version });
    expect(disableSelf.status).toBe(422);
    expect(disableSelf.body.fields).toEqual({ status: 'self' });
  });

  it('answers unknown and malformed ids with 404 and 400', async () => {
    const unknown = await t
      .http()
      .patch('/api/users/00000000-0000-4000-8000-000000000000')
      .set(as('desk_chief'))
      .send({ role: 'reporter', version: 1 });
    expect(unknown.status).toBe(404);
    const malformed = await t
      .http()
      .patch('/api/users/not-a-uuid')
      .set(as('desk_chief'))
      .send({ version: 1 });
    expect(malformed.status).toBe(400);
    expect(malformed.body.fields).toEqual({ id: 'isUuid' });
  });
});
