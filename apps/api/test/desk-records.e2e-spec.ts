import { type AuditEventView, type OutboxPage, type Page } from '@skyledger/contracts';
import { parse } from 'csv-parse/sync';
import { OutboxMessage } from '../src/mail/entities/outbox-message.entity';
import { createTestApp, testPassword, type TestApp } from './support/test-app';

describe('the desk chief’s records: the outbox and the audit trail', () => {
  let t: TestApp;
  let chief: string;
  let reporter: string;
  let chiefId: string;
  const as = (token: string) => ({ Authorization: `Bearer ${token}` });

  beforeAll(async () => {
    t = await createTestApp('desk_records', { OUTBOX_WORKER_ENABLED: 'false' });
    chiefId = (await t.addUser('desk_chief', 'chief@records.test')).id;
    await t.addUser('reporter', 'reporter@records.test');
    chief = (await t.signIn('chief@records.test', testPassword)).accessToken;
    reporter = (await t.signIn('reporter@records.test', testPassword)).accessToken;
    for (const name of ['Ada', 'Bea']) {
      await t
        .http()
        .post('/api/users/invitations')
        .set(as(chief))
        .send({ email: `${name.toLowerCase()}@records.test`, displayName: name, role: 'reporter' })
        .expect(201);
    }
  });
  afterAll(() => t.close());

  it('lists the outbox with states and counts, and retries a failed mail', async () => {
    const [first] = await t.dataSource
      .getRepository(OutboxMessage)
      .find({ order: { createdAt: 'ASC' } });
    await t.dataSource.getRepository(OutboxMessage).update(first!.id, {
      state: 'failed',
      attempts: 8,
      lastError: 'Error: 550 mailbox unavailable',
    });

    const page = (await t.http().get('/api/outbox').set(as(chief)).expect(200)).body as OutboxPage;
    expect(page.counts).toEqual({ pending: 1, sending: 0, sent: 0, failed: 1 });
    expect(page.items.map((item) => item.to).sort()).toEqual([
      'ada@records.test',
      'bea@records.test',
    ]);
    const failed = (
      await t.http().get('/api/outbox').query({ state: 'failed' }).set(as(chief)).expect(200)
    ).body as OutboxPage;
    expect(failed.items).toEqual([
      expect.objectContaining({
        id: first!.id,
        state: 'failed',
        attempts: 8,
        lastError: 'Error: 550 mailbox unavailable',
      }),
    ]);

    const retried = await t.http().post(`/api/outbox/${first!.id}/retry`).set(as(chief));
    expect(retried.status).toBe(200);
    expect(retried.body).toMatchObject({ state: 'pending', attempts: 0, lastError: null });

    await t.dataSource.getRepository(OutboxMessage).update(first!.id, { state: 'sent' });
    const again = await t.http().post(`/api/outbox/${first!.id}/retry`).set(as(chief));
    expect(again.status).toBe(409);
    expect(again.body.fields).toEqual({ state: 'sent' });

    expect((await t.http().get('/api/outbox').set(as(reporter))).status).toBe(403);
    const badState = await t.http().get('/api/outbox').query({ state: 'lost' }).set(as(chief));
    expect(badState.status).toBe(400);
    expect(Object.keys(badState.body.fields)).toEqual(['state']);
  });

  it('filters the audit trail and exports the same events as CSV', async () => {
    const invites = (
      await t.http().get('/api/audit').query({ action: 'user.invited' }).set(as(chief)).expect(200)
    ).body as Page<AuditEventView>;
    expect(invites.total).toBe(2);
    expect(invites.items.every((event) => event.actor?.id === chiefId)).toBe(true);

    const today = new Date().toISOString().slice(0, 10);
    const byDate = (
      await t.http().get('/api/audit').query({ from: today, to: today }).set(as(chief)).expect(200)
    ).body as Page<AuditEventView>;
    expect(byDate.total).toBeGreaterThanOrEqual(3); // two invitations and the retry
    const past = (
      await t.http().get('/api/audit').query({ to: '2001-01-01' }).set(as(chief)).expect(200)
    ).body as Page<AuditEventView>;
    expect(past.total).toBe(0);

    const csv = await t
      .http()
      .get('/api/audit/export')
      .query({ action: 'user.invited' })
      .set(as(chief));
    expect(csv.status).toBe(200);
    expect(csv.headers['content-type']).toMatch(/^text\/csv/);
    expect(csv.headers['content-disposition']).toBe('attachment; filename="skyledger-audit.csv"');
    const rows = parse(csv.text, { columns: true }) as Array<Record<string, string>>;
    expect(rows).toHaveLength(2);
    expect(rows[0]).toMatchObject({
      action: 'user.invited',
      actor_id: chiefId,
      entity_type: 'user',
    });
    expect(JSON.parse(rows[0]!.summary!)).toEqual(expect.any(Object));

    expect((await t.http().get('/api/audit').set(as(reporter))).status).toBe(403);
    expect((await t.http().get('/api/audit/export').set(as(reporter))).status).toBe(403);
    const badDate = await t.http().get('/api/audit').query({ from: 'yesterday' }).set(as(chief));
    expect(badDate.status).toBe(400);
    expect(Object.keys(badDate.body.fields)).toEqual(['from']);
  });
});
