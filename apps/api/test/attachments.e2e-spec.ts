import { roles, type AttachmentView, type ClaimDetail, type Role } from '@skyledger/contracts';
import { readdir } from 'node:fs/promises';
import { join } from 'node:path';
import { In } from 'typeorm';
import { Attachment } from '../src/attachments/entities/attachment.entity';
import { AuditEvent } from '../src/audit/entities/audit-event.entity';
import {
  asBytes,
  elfExecutable,
  onePixelPng,
  plainNotes,
  temperatureCsv,
  tinyPdf,
  windowsExecutable,
} from './support/evidence-files';
import { createTestApp, testPassword, type TestApp } from './support/test-app';

const MAX_BYTES = 4096;

/** Every file under a folder, recursively, as paths relative to it. */
async function filesUnder(root: string): Promise<string[]> {
  try {
    const entries = await readdir(root, { recursive: true, withFileTypes: true });
    return entries
      .filter((entry) => entry.isFile())
      .map((entry) => join(entry.parentPath, entry.name).slice(root.length + 1))
      .sort();
  } catch {
    return [];
  }
}

describe('evidence files: upload, typing from the bytes, storage once per content, download', () => {
  let t: TestApp;
  const tokens: Partial<Record<Role, string>> = {};
  const as = (role: Role) => ({ Authorization: `Bearer ${tokens[role]}` });
  let claim: ClaimDetail;
  let otherClaim: ClaimDetail;

  const upload = (claimId: string, bytes: Buffer, name: string, role: Role = 'reporter') =>
    t.http().post(`/api/claims/${claimId}/attachments`).set(as(role)).attach('file', bytes, name);
  const rowCount = () => t.dataSource.getRepository(Attachment).count();
  const storedFiles = async () =>
    (await filesUnder(t.filesDir)).filter((path) => path.startsWith('sha256/'));
  const stagedFiles = async () =>
    (await filesUnder(t.filesDir)).filter((path) => path.startsWith('.incoming/'));

  beforeAll(async () => {
    t = await createTestApp('attachments', { UPLOAD_MAX_BYTES: String(MAX_BYTES) });
    for (const role of roles) {
      const user = await t.addUser(role, `${role.replace('_', '-')}@files.test`);
      tokens[role] = (await t.signIn(user.email, testPassword)).accessToken;
    }
    const file = (summary: string) =>
      t
        .http()
        .post('/api/claims')
        .set(as('reporter'))
        .send({
          text: `${summary}, as said at the harbour meeting.`,
          summary,
          topics: ['solar'],
          claimant: { name: `Claimant of ${summary}`, kind: 'organisation' },
        });
    claim = (await file('The sun explains all recent warming')).body;
    otherClaim = (await file('Volcanoes emit more CO2 than people')).body;
  });
  afterAll(() => t.close());

  it('takes a PNG, types it from its bytes, records who and when, and audits it', async () => {
    const response = await upload(claim.id, onePixelPng, 'harbour-post.png');
    expect(response.status).toBe(201);
    const view = response.body as AttachmentView;
    expect(view).toMatchObject({
      originalName: 'harbour-post.png',
      mediaType: 'image/png',
      size: onePixelPng.length,
      // SHA-256 of the bytes, computed independently here with node:crypto.
      sha256: (await import('node:crypto')).createHash('sha256').update(onePixelPng).digest('hex'),
      uploadedBy: { displayName: 'reporter' },
    });
    const event = await t.dataSource
      .getRepository(AuditEvent)
      .findOneByOrFail({ entityId: view.id });
    expect(event).toMatchObject({
      action: 'attachment.uploaded',
      claimId: claim.id,
      summary: { mediaType: 'image/png', bytes: 'stored' },
    });
    const detail = await t.http().get(`/api/claims/${claim.id}`).set(as('copy_desk')).expect(200);
    expect((detail.body as ClaimDetail).attachments.map((a) => a.id)).toEqual([view.id]);
  });

  it('types PDF, CSV and plain text from their bytes', async () => {
    const cases: Array<[Buffer, string, string]> = [
      [tinyPdf, 'council-minutes.pdf', 'application/pdf'],
      [temperatureCsv, 'anomalies.csv', 'text/csv'],
      [temperatureCsv, 'no-extension', 'text/csv'],
      [plainNotes, 'call-notes.txt', 'text/plain'],
    ];
    for (const [bytes, name, mediaType] of cases) {
      const response = await upload(claim.id, bytes, name);
      expect({ name, status: response.status, mediaType: response.body.mediaType }).toEqual({
        name,
        status: 201,
        mediaType,
      });
    }
  });

  it('gives a name without the right extension one, and drops any folders from it', async () => {
    const bare = await upload(claim.id, tinyPdf, 'scan');
    expect(bare.body.originalName).toBe('scan.pdf');
    const traversal = await upload(claim.id, plainNotes, '../../etc/passwd.txt');
    expect(traversal.status).toBe(201);
    expect(traversal.body.originalName).toBe('passwd.txt');
    const windows = await upload(claim.id, plainNotes, 'C:\\Users\\desk\\notes.txt');
    expect(windows.body.originalName).toBe('notes.txt');
  });

  it('refuses executables in disguise and files whose name lies, storing nothing', async () => {
    const rowsBefore = await rowCount();
    const storedBefore = await storedFiles();
    const cases: Array<[Buffer, string, string]> = [
      [elfExecutable, 'report.pdf', 'unsupportedType'],
      [windowsExecutable, 'minutes.pdf', 'unsupportedType'],
      [Buffer.from([0x00, 0x01, 0x02, 0xff, 0xfe, 0x00]), 'data.csv', 'unsupportedType'],
      [plainNotes, 'screenshot.png', 'typeMismatch'],
      [onePixelPng, 'statement.pdf', 'typeMismatch'],
    ];
    for (const [bytes, name, code] of cases) {
      const response = await upload(claim.id, bytes, name);
      expect({ name, status: response.status, fields: response.body.fields }).toEqual({
        name,
        status: 415,
        fields: { file: code },
      });
      expect(response.body.message).toEqual(expect.any(String));
    }
    expect(await rowCount()).toBe(rowsBefore);
    expect(await storedFiles()).toEqual(storedBefore);
    expect(await stagedFiles()).toEqual([]);
  });

  it('refuses a file over the configured limit with 413, keeping nothing', async () => {
    const rowsBefore = await rowCount();
    const storedBefore = await storedFiles();
    const big = Buffer.alloc(MAX_BYTES + 1, 'a');
    const response = await upload(claim.id, big, 'long-notes.txt');
    expect(response.status).toBe(413);
    expect(response.body).toMatchObject({
      statusCode: 413,
      fields: { file: 'tooLarge' },
      message: 'The file is larger than the limit of 4096 bytes',
    });
    expect(await rowCount()).toBe(rowsBefore);
    expect(await storedFiles()).toEqual(storedBefore);
    expect(await stagedFiles()).toEqual([]);
    // Exactly at the limit is fine.
    expect((await upload(claim.id, Buffer.alloc(MAX_BYTES, 'a'), 'full.txt')).status).toBe(201);
  });

  it('stores identical bytes once, whatever the name or claim, with a row per upload', async () => {
    const first = await upload(claim.id, onePixelPng, 'first.png');
    const again = await upload(otherClaim.id, onePixelPng, 'again.png', 'science_editor');
    expect([first.status, again.status]).toEqual([201, 201]);
    expect(again.body.sha256).toBe(first.body.sha256);
    const rows = await t.dataSource
      .getRepository(Attachment)
      .findBy({ id: In([first.body.id, again.body.id]) });
    expect(rows.map((row) => row.claimId).sort()).toEqual([claim.id, otherClaim.id].sort());
    expect(rows[0]!.storageKey).toBe(rows[1]!.storageKey);
    const copies = (await storedFiles()).filter((path) => path.endsWith(first.body.sha256));
    expect(copies).toEqual([`sha256/${first.body.sha256.slice(0, 2)}/${first.body.sha256}`]);
    const event = await t.dataSource
      .getRepository(AuditEvent)
      .findOneByOrFail({ entityId: again.body.id });
    expect(event.summary).toMatchObject({ bytes: 'already stored' });
  });

  it('serves images and PDFs inline and other files as downloads, never sniffed', async () => {
    const png = await upload(claim.id, onePixelPng, 'Gezeitenmessung – Jänner.png');
    const image = await t
      .http()
      .get(`/api/attachments/${png.body.id}`)
      .set(as('copy_desk'))
      .buffer(true)
      .parse(asBytes);
    expect(image.status).toBe(200);
    expect(Buffer.compare(image.body as Buffer, onePixelPng)).toBe(0);
    expect(image.headers['content-type']).toBe('image/png');
    expect(image.headers['content-length']).toBe(String(onePixelPng.length));
    expect(image.headers['x-content-type-options']).toBe('nosniff');
    expect(image.headers['content-disposition']).toBe(
      `inline; filename="Gezeitenmessung ? J?nner.png"; filename*=UTF-8''Gezeitenmessung%20%E2%80%93%20J%C3%A4nner.png`,
    );

    const csv = await upload(claim.id, temperatureCsv, 'series.csv');
    const download = await t.http().get(`/api/attachments/${csv.body.id}`).set(as('reporter'));
    expect(download.status).toBe(200);
    expect(download.headers['content-type']).toMatch(/^text\/csv/);
    expect(download.headers['content-disposition']).toBe('attachment; filename=series.csv');
    expect(download.text).toBe(temperatureCsv.toString('utf8'));
  });

  it('answers 400, 403 and 404 in the one error shape', async () => {
    const missing = await t
      .http()
      .post(`/api/claims/${claim.id}/attachments`)
      .set(as('reporter'))
      .field('note', 'no file here');
    expect(missing.status).toBe(400);
    expect(missing.body).toMatchObject({ statusCode: 400, fields: { file: 'required' } });

    const copyDesk = await upload(claim.id, onePixelPng, 'x.png', 'copy_desk');
    expect(copyDesk.status).toBe(403);

    const unknownClaim = await upload('3f1c6f0e-8a4b-4c4e-9d7e-2b1a0c9d8e7f', plainNotes, 'a.txt');
    expect(unknownClaim.status).toBe(404);
    const badId = await upload('not-a-uuid', plainNotes, 'a.txt');
    expect(badId.status).toBe(400);
    expect(badId.body.fields).toEqual({ id: 'isUuid' });

    const unknownFile = await t
      .http()
      .get('/api/attachments/3f1c6f0e-8a4b-4c4e-9d7e-2b1a0c9d8e7f')
      .set(as('reporter'));
    expect(unknownFile.status).toBe(404);
    const anonymous = await t.http().get(`/api/attachments/${claim.id}`);
    expect(anonymous.status).toBe(401);
    // Nothing of the refused uploads is left waiting in the staging folder.
    expect(await stagedFiles()).toEqual([]);
  });
});
