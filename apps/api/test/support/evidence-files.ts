import { type Response } from 'superagent';

/**
 * Small real files for upload tests. Each starts with its format's published signature,
 * which is what the desk reads to type an upload.
 */

/** A 1×1 PNG (signature per the PNG spec, ISO/IEC 15948, section 5.2). */
export const onePixelPng = Buffer.from(
  'iVBORw0KGgoAAAANSUhEUgAAAAEAAAABCAYAAAAfFcSJAAAADUlEQVR42mNkYPhfDwAChwGA60e6kgAAAABJRU5ErkJggg==',
  'base64',
);

/** A one-page PDF skeleton: the `%PDF-` header (ISO 32000-1, section 7.5.2) and an EOF marker. */
export const tinyPdf = Buffer.from(
  '%PDF-1.4\n1 0 obj << /Type /Catalog /Pages 2 0 R >> endobj\n' +
    '2 0 obj << /Type /Pages /Kids [] /Count 0 >> endobj\ntrailer << /Root 1 0 R >>\n%%EOF\n',
  'latin1',
);

/** The start of an ELF executable: magic 0x7F 'E' 'L' 'F', 64-bit, little-endian, then zeros. */
export const elfExecutable = Buffer.concat([
  Buffer.from([0x7f, 0x45, 0x4c, 0x46, 0x02, 0x01, 0x01, 0x00]),
  Buffer.alloc(120),
]);

/** A DOS/Windows executable header: 'MZ', padding, and the PE signature at the offset it names. */
export const windowsExecutable = (() => {
  const bytes = Buffer.alloc(256);
  bytes.write('MZ', 0, 'latin1');
  bytes.writeUInt32LE(0x80, 0x3c);
  bytes.write('PE\0\0', 0x80, 'latin1');
  return bytes;
})();

export const temperatureCsv = Buffer.from(
  'year,anomaly_c\n2019,0.98\n2020,1.01\n2021,0.85\n',
  'utf8',
);

export const plainNotes = Buffer.from('Called the press office at 10:05; they will call back.\n');

/** A supertest parser that keeps a response body as raw bytes: `.buffer(true).parse(asBytes)`. */
export function asBytes(
  response: Response,
  done: (error: Error | null, body: Buffer) => void,
): void {
  const chunks: Buffer[] = [];
  response.on('data', (chunk: Buffer) => chunks.push(chunk));
  response.on('end', () => done(null, Buffer.concat(chunks)));
}
