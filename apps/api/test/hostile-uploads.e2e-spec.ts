import { type AttachmentView, type ClaimDetail } from '@skyledger/contracts';
import { parse as parseDisposition } from 'content-disposition';
import { readdir, stat } from 'node:fs/promises';
import { join, relative, resolve } from 'node:path';
import { crc32 } from 'node:zlib';
import { Attachment } from '../src/attachments/entities/attachment.entity';
import { DeskFlow } from './support/desk-flow';
import {
  asBytes,
  onePixelPng,
  plainNotes,
  temperatureCsv,
  tinyPdf,
} from './support/evidence-files';
import { extendedFilename, quotedFilename, rawMultipart } from './support/raw-multipart';
import { createTestApp, type TestApp } from './support/test-app';

// ——— Hostile files: each is a real file of an accepted type carrying something more ———

const html = (id: string) =>
  `<html><body><script>console.log('SKYLEDGER-XSS-${id}');alert(1)</script></body></html>`;

/** A ZIP archive of one stored file, `hello.txt` (PKWARE APPNOTE 6.3.10, sections 4.3.7–4.3.16). */
function zipArchive(): Buffer {
  const name = Buffer.from('hello.txt');
  const data = Buffer.from('hello from inside the archive\n');
  const crc = crc32(data);
  const local = Buffer.alloc(30);
  local.writeUInt32LE(0x04034b50, 0);
  local.writeUInt16LE(20, 4);
  local.writeUInt32LE(crc, 14);
  local.writeUInt32LE(data.length, 18);
  local.writeUInt32LE(data.length, 22);
  local.writeUInt16LE(name.length, 26);
  const central = Buffer.alloc(46);
  central.writeUInt32LE(0x02014b50, 0);
  central.writeUInt16LE(20, 4);
  central.writeUInt16LE(20, 6);
  central.writeUInt32LE(crc, 16);
  central.writeUInt32LE(data.length, 20);
  central.writeUInt32LE(data.length, 24);
  central.writeUInt16LE(name.length, 28);
  const end = Buffer.alloc(22);
  end.writeUInt32LE(0x06054b50, 0);
  end.writeUInt16LE(1, 8);
  end.writeUInt16LE(1, 10);
  end.writeUInt32LE(central.length + name.length, 12);
  end.writeUInt32LE(local.length + name.length + data.length, 16);
  return Buffer.concat([local, name, data, central, name, end]);
}

/** A PDF whose opening runs JavaScript (ISO 32000-1, 12.6.4.16), `name` spelling the key. */
const pdfWithScript = (name: string) =>
  Buffer.from(
    `%PDF-1.4\n1 0 obj << /Type /Catalog /Pages 2 0 R /OpenAction << /S /${name} /JS (app.alert(1)) >> >> endobj\n` +
      '2 0 obj << /Type /Pages /Kids [] /Count 0 >> endobj\ntrailer << /Root 1 0 R >>\n%%EOF\n',
    'latin1',
  );

/** [what it is, its bytes, the name it is uploaded under, the refusal code]. */
const polyglots: Array<[string, Buffer, string, string]> = [
  [
    'a GIF header with an HTML body',
    Buffer.from(`GIF89a${html('gif')}`),
    'chart.gif',
    'unsupportedType',
  ],
  [
    'GIF/JavaScript (GIF89a=…;alert)',
    Buffer.from('GIF89a/*\x00\x00*/=1;alert(1);'),
    'x.png',
    'unsupportedType',
  ],
  [
    'a PNG with a script appended',
    Buffer.concat([onePixelPng, Buffer.from(html('png'))]),
    'shot.png',
    'activeContent',
  ],
  [
    'a PNG with bytes after its end',
    Buffer.concat([onePixelPng, Buffer.from('tail')]),
    'shot.png',
    'malformed',
  ],
  [
    'a PNG with a ZIP appended',
    Buffer.concat([onePixelPng, zipArchive()]),
    'shot.png',
    'malformed',
  ],
  [
    'a JPEG signature with an HTML body',
    Buffer.concat([Buffer.from([0xff, 0xd8, 0xff, 0xe0]), Buffer.from(html('jpeg'))]),
    'photo.jpg',
    'activeContent',
  ],
  [
    'a JPEG signature with an SVG body',
    Buffer.concat([Buffer.from([0xff, 0xd8, 0xff, 0xe0]), Buffer.from('<svg/onload=alert(1)>')]),
    'photo.jpg',
    'activeContent',
  ],
  [
    'a PDF header with an HTML body',
    Buffer.from(`%PDF-1.4\n${html('pdf')}\n%%EOF\n`),
    'minutes.pdf',
    'activeContent',
  ],
  [
    'a PDF header with no PDF after it',
    Buffer.from('%PDF-1.4\nnothing more'),
    'minutes.pdf',
    'malformed',
  ],
  [
    'a PDF that runs JavaScript on opening',
    pdfWithScript('JavaScript'),
    'minutes.pdf',
    'activeContent',
  ],
  [
    'a PDF that hides /JavaScript as /J#61vaScript',
    pdfWithScript('J#61vaScript'),
    'minutes.pdf',
    'activeContent',
  ],
  ['a PDF with a ZIP appended', Buffer.concat([tinyPdf, zipArchive()]), 'minutes.pdf', 'malformed'],
  ['a ZIP archive named as a PDF', zipArchive(), 'minutes.pdf', 'unsupportedType'],
  [
    'an SVG with a script',
    Buffer.from(`<svg xmlns="http://www.w3.org/2000/svg"><script>alert(1)</script></svg>`),
    'logo.svg',
    'activeContent',
  ],
  [
    'an SVG with an onload handler',
    Buffer.from('<svg xmlns="http://www.w3.org/2000/svg" onload="alert(1)"/>'),
    'logo.svg',
    'activeContent',
  ],
  [
    'a harmless SVG (the desk keeps no SVG)',
    Buffer.from('<svg xmlns="http://www.w3.org/2000/svg"><rect width="1" height="1"/></svg>'),
    'logo.svg',
    'activeContent',
  ],
  [
    'an SVG with an XML declaration',
    Buffer.from('<?xml version="1.0"?><svg xmlns="http://www.w3.org/2000/svg"/>'),
    'logo.svg',
    'unsupportedType',
  ],
  [
    'an HTML page named as notes',
    Buffer.from(`<!DOCTYPE html>${html('txt')}`),
    'notes.txt',
    'activeContent',
  ],
  [
    'notes with an event handler',
    Buffer.from('Called at 10:05. <img src=x onerror=alert(1)>\n'),
    'notes.txt',
    'activeContent',
  ],
  [
    'a CSV with a script in a cell',
    Buffer.from(`year,note\n2020,"${html('csv')}"\n2021,ok\n`),
    'series.csv',
    'activeContent',
  ],
];

/** [what it is, the name as the client sends it, how it is sent]. */
const hostileNames: Array<[string, string, 'quoted' | 'extended']> = [
  ['a Unix path out of the store', '../../etc/passwd', 'quoted'],
  ['a Windows path out of the store', '..\\..\\boot.ini', 'quoted'],
  ['an absolute path', '/abs/path.txt', 'quoted'],
  ['an encoded path', '..%2F..%2Fetc%2Fshadow', 'quoted'],
  ['a path in filename*', '../../../etc/hosts', 'extended'],
  ['a drive path', 'C:\\Windows\\win.ini', 'quoted'],
  ['a NUL byte', 'notes\u0000.exe', 'extended'],
  ['control characters', '\u0007bell\u001b[31mred\u007f\u0085.txt', 'extended'],
  ['a right-to-left override', 'report\u202Egnp.exe', 'extended'],
  ['bidirectional isolates', 'memo\u2066\u2069\u200F.txt', 'extended'],
  ['line and paragraph separators', 'a\u2028b\u2029c.txt', 'extended'],
  ['quotes and semicolons', 'say "hi"; filename=evil.html; x=".txt', 'extended'],
  ['a CRLF header injection', 'x.txt\r\nSet-Cookie: pwned=1\r\nX-Injected: 1', 'extended'],
  ['a lone CR and LF', 'x\rX-Injected: 1\ny.txt', 'extended'],
  ['a very long name', `${'a'.repeat(1000)}.txt`, 'quoted'],
  ['a very long name of emoji', `${'🌍'.repeat(400)}.txt`, 'extended'],
  ['markup', '<img src=x onerror=alert(1)>.txt', 'extended'],
  ['only dots, as a file name', '....txt', 'quoted'],
];

/** Names that are no name at all once their folders go: multer then sees no file (busboy's basename). */
const emptyNames = ['..', '/', '../', '..\\', 'a/..'];

/** Characters no stored name may hold (see safeOriginalName). */
const unsafeCharacter =
  // eslint-disable-next-line no-control-regex
  /[\u0000-\u001F\u007F-\u009F\u061C\u200E\u200F\u2028-\u202E\u2066-\u2069/\\]/;

/**
 * Each path outside the store that a hostile name would reach if it were joined to the
 * store or its staging folder, with its modification time (null where nothing is).
 */
async function outsideState(filesDir: string): Promise<Record<string, number | null>> {
  const store = resolve(filesDir);
  const state: Record<string, number | null> = {};
  for (const [, name] of hostileNames) {
    for (const base of [store, join(store, '.incoming'), join(store, 'sha256', '00')]) {
      const target = resolve(base, name.replace(/\\/g, '/'));
      if (target === store || target.startsWith(`${store}/`)) continue;
      state[target] = await stat(target).then(
        (found) => found.mtimeMs,
        () => null,
      );
    }
  }
  return state;
}

async function filesUnder(root: string): Promise<string[]> {
  try {
    const entries = await readdir(root, { recursive: true, withFileTypes: true });
    return entries
      .filter((entry) => entry.isFile())
      .map((entry) => relative(root, join(entry.parentPath, entry.name)))
      .sort();
  } catch {
    return [];
  }
}

describe('hostile uploads: polyglots refused, hostile names harmless, files served safely', () => {
  let t: TestApp;
  let desk: DeskFlow;
  let claim: ClaimDetail;
  let outsideBefore: Record<string, number | null>;

  const rowCount = () => t.dataSource.getRepository(Attachment).count();
  const sendRaw = (bytes: Buffer, disposition: string) => {
    const { contentType, body } = rawMultipart(bytes, disposition);
    return t
      .http()
      .post(`/api/claims/${claim.id}/attachments`)
      .set(desk.as('editor'))
      .set('Content-Type', contentType)
      .send(body);
  };
  const download = (id: string) =>
    t.http().get(`/api/attachments/${id}`).set(desk.as('copy')).buffer(true).parse(asBytes);

  /** The headers every served file must carry, whatever it is. */
  function expectSafelyServed(
    response: { headers: Record<string, string | undefined> },
    name: string,
    disposition: 'inline' | 'attachment',
  ): void {
    expect(response.headers['x-content-type-options']).toBe('nosniff');
    const policy = response.headers['content-security-policy'] ?? '';
    expect(policy.split(/;\s*/)).toEqual(expect.arrayContaining(["default-src 'none'", 'sandbox']));
    expect(policy).not.toMatch(/script-src/);
    const header = response.headers['content-disposition'] ?? '';
    // RFC 6266: one disposition, a plain-ASCII `filename` and the exact name in `filename*`.
    expect(header).not.toMatch(/[\r\n]/);
    const parsed = parseDisposition(header);
    expect(parsed.type).toBe(disposition);
    expect(parsed.parameters.filename).toBe(name);
    expect(Object.keys(parsed.parameters).sort()).toEqual(
      header.includes('filename*=') ? ['filename', 'filename*'] : ['filename'],
    );
    // The fallback for old clients is printable ASCII only.
    expect(header).toMatch(/^(inline|attachment); filename=("[\x20-\x7e]*"|[\x21-\x7e]+)(; |$)/);
    expect(response.headers['set-cookie']).toBeUndefined();
    expect(response.headers['x-injected']).toBeUndefined();
    downloadsChecked += 1;
  }

  beforeAll(async () => {
    t = await createTestApp('hostile_uploads', {
      PUBLISHER_ENABLED: 'false',
      OUTBOX_WORKER_ENABLED: 'false',
    });
    outsideBefore = await outsideState(t.filesDir);
    desk = await DeskFlow.start(t, 'hostile-uploads.test');
    claim = await desk.clearedClaim('The harbour wall report was doctored, a caller said');
  });
  let refused = 0;
  let namesKept = 0;
  let downloadsChecked = 0;
  let writtenOutside = -1;
  afterAll(async () => {
    console.info(
      `Hostile uploads: ${refused} of ${polyglots.length} polyglots and disguised files refused, ` +
        `${namesKept} of ${hostileNames.length} hostile names stored harmless, ` +
        `${downloadsChecked} downloads served sandboxed with nosniff, files written outside the store ${writtenOutside}`,
    );
    await t.close();
  });

  it.each(polyglots)('refuses %s with 415, storing nothing', async (_what, bytes, name, code) => {
    const rowsBefore = await rowCount();
    const storedBefore = await filesUnder(join(t.filesDir, 'sha256'));
    const response = await t
      .http()
      .post(`/api/claims/${claim.id}/attachments`)
      .set(desk.as('editor'))
      .attach('file', bytes, name);
    expect({ status: response.status, body: response.body }).toEqual({
      status: 415,
      body: {
        statusCode: 415,
        error: 'Unsupported Media Type',
        message: expect.any(String),
        fields: { file: code },
      },
    });
    expect(await rowCount()).toBe(rowsBefore);
    expect(await filesUnder(join(t.filesDir, 'sha256'))).toEqual(storedBefore);
    expect(await filesUnder(join(t.filesDir, '.incoming'))).toEqual([]);
    refused += 1;
  });

  it('still takes the well-formed files those polyglots imitate', async () => {
    for (const [bytes, name] of [
      [onePixelPng, 'shot.png'],
      [tinyPdf, 'minutes.pdf'],
      [temperatureCsv, 'series.csv'],
      [plainNotes, 'notes.txt'],
    ] as const) {
      const response = await t
        .http()
        .post(`/api/claims/${claim.id}/attachments`)
        .set(desk.as('editor'))
        .attach('file', bytes, name);
      expect({ name, status: response.status }).toEqual({ name, status: 201 });
    }
  });

  it.each(hostileNames)(
    'keeps a name with %s harmless, and serves it back safely',
    async (_what, name, how) => {
      const response = await sendRaw(
        plainNotes,
        how === 'quoted' ? quotedFilename(name) : extendedFilename(name),
      );
      expect({ status: response.status, body: response.body as unknown }).toMatchObject({
        status: 201,
      });
      const view = response.body as AttachmentView;
      const stored = view.originalName;
      expect(stored).not.toMatch(unsafeCharacter);
      expect(stored).not.toMatch(/^\.\.?$/);
      expect(Array.from(stored).length).toBeLessThanOrEqual(255);
      expect(stored.endsWith('.txt')).toBe(true);
      // No half of a surrogate pair is left behind by the cut to 255 characters.
      expect(stored).toBe(Buffer.from(stored, 'utf8').toString('utf8'));
      expect(stored).not.toContain('\uFFFD');
      const row = await t.dataSource.getRepository(Attachment).findOneByOrFail({ id: view.id });
      expect(row.originalName).toBe(stored);
      expect(row.storageKey).toBe(`sha256/${view.sha256.slice(0, 2)}/${view.sha256}`);

      const served = await download(view.id);
      expect(served.status).toBe(200);
      expect(served.headers['content-type']).toMatch(/^text\/plain/);
      expectSafelyServed(served, stored, 'attachment');
      namesKept += 1;
    },
  );

  it.each(emptyNames)(
    'answers a name %j that is only a path with 400 naming the file',
    async (name) => {
      const rowsBefore = await rowCount();
      const response = await sendRaw(plainNotes, quotedFilename(name));
      expect({ status: response.status, body: response.body as unknown }).toEqual({
        status: 400,
        body: {
          statusCode: 400,
          error: 'Bad Request',
          message: 'Attach a file in the field "file"',
          fields: { file: 'required' },
        },
      });
      expect(await rowCount()).toBe(rowsBefore);
    },
  );

  it('writes nothing outside the store, whatever the names said', async () => {
    for (const path of await filesUnder(t.filesDir)) {
      expect(path).toMatch(/^sha256\/[0-9a-f]{2}\/[0-9a-f]{64}$/);
    }
    // Every place a name could have led, as it was before the first upload.
    const after = await outsideState(t.filesDir);
    writtenOutside = Object.keys(after).filter(
      (path) => after[path] !== outsideBefore[path],
    ).length;
    expect(after).toEqual(outsideBefore);
  });

  it('serves images and PDFs inline and text as downloads, all sandboxed and never sniffed', async () => {
    for (const [bytes, name, type, disposition] of [
      [onePixelPng, 'shot.png', 'image/png', 'inline'],
      [tinyPdf, 'minutes.pdf', 'application/pdf', 'inline'],
      [temperatureCsv, 'series.csv', 'text/csv', 'attachment'],
      [plainNotes, 'notes.txt', 'text/plain', 'attachment'],
    ] as const) {
      const uploaded = await sendRaw(bytes, extendedFilename(`Prüfbericht “${name}”`));
      expect(uploaded.status).toBe(201);
      const view = uploaded.body as AttachmentView;
      const served = await download(view.id);
      expect(served.status).toBe(200);
      expect(served.headers['content-type']).toMatch(new RegExp(`^${type}`));
      expect(Buffer.compare(served.body as Buffer, bytes)).toBe(0);
      expectSafelyServed(served, view.originalName, disposition);
    }
  });

  it('serves a published capture to readers under the same sandbox', async () => {
    const uploaded = await sendRaw(onePixelPng, extendedFilename('../capture"; x=.png'));
    expect(uploaded.status).toBe(201);
    const capture = uploaded.body as AttachmentView;
    const appearance = (await desk.detail(claim.id)).appearances[0]!;
    await t
      .http()
      .patch(`/api/claims/${claim.id}/appearances/${appearance.id}`)
      .set(desk.as('editor'))
      .send({ captureAttachmentId: capture.id, version: appearance.version })
      .expect(200);
    const slug = await desk.publishNow(claim.id);
    const served = await t
      .http()
      .get(`/explainers/${slug}/captures/${capture.id}`)
      .buffer(true)
      .parse(asBytes);
    expect(served.status).toBe(200);
    expect(served.headers['content-type']).toBe('image/png');
    expectSafelyServed(served, capture.originalName, 'inline');
  });
});
