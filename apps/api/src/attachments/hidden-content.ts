import { type AttachmentMediaType } from '@skyledger/contracts';

/** Why a file whose type is accepted is refused all the same, or null when it is clean. */
export type HiddenContent = {
  reason: 'activeContent' | 'malformed';
  message: string;
} | null;

/**
 * Tags that make a browser treat bytes as a document or run script (the HTML and XML
 * patterns of the WHATWG MIME Sniffing standard, section 7.1, the script-bearing elements)
 * and any tag with an event-handler attribute (`<img src=x onerror=...>`). Compressed image
 * data holds such a run of ASCII by chance about once in 2^48.
 */
const markup =
  /<(?:!doctype\s+html|html|head|body|script|iframe|frameset|object|embed|svg|\?xml)(?=[\s/>-])|<[a-z][a-z0-9-]*[\s/][^<>]{0,200}?\bon[a-z]+\s*=/i;
const QUOTED_MAX = 40;

/** PDF name objects that run code: JavaScript actions and the Launch action (ISO 32000-1, 12.6.4). */
const pdfActions = new Set(['JavaScript', 'JS', 'Launch']);
/** A PDF name token, e.g. `/JavaScript` or its `#xx`-escaped spelling `/J#61vaScript` (7.3.5). */
const pdfName = /\/(?:[A-Za-z0-9]|#[0-9A-Fa-f]{2})+/g;

/** The IEND chunk every PNG ends with: length 0, type, CRC (ISO/IEC 15948, 5.6 and 11.2.5). */
const pngEnd = Buffer.from('0000000049454e44ae426082', 'hex');
/** ZIP's end-of-central-directory record: signature, 22 bytes, then a comment (APPNOTE 4.3.16). */
const zipEndSignature = Buffer.from('504b0506', 'hex');
const ZIP_END_LENGTH = 22;
const ZIP_COMMENT_MAX = 0xffff;
/** Readers look for `%%EOF` in the last kilobyte (ISO 32000-1, 7.5.5, and Acrobat's practice). */
const PDF_EOF_WINDOW = 1024;

const markupAdvice =
  'the desk keeps no HTML, SVG or script: save the page as a PDF or a screenshot and upload that';

/**
 * What a file carries besides what its type says: markup or script a browser could run,
 * code in a PDF, or a second file hidden behind the first (a polyglot: bytes after a PNG's
 * end, a WebP longer than its RIFF header says, a ZIP archive appended to anything).
 */
export function findHiddenContent(bytes: Buffer, mediaType: AttachmentMediaType): HiddenContent {
  const text = bytes.toString('latin1');
  const tag = markup.exec(text);
  if (tag) {
    return {
      reason: 'activeContent',
      message: `The file holds web-page markup (${tag[0].slice(0, QUOTED_MAX)}…): ${markupAdvice}.`,
    };
  }
  if (mediaType === 'application/pdf') {
    const action = pdfActionIn(text);
    if (action) {
      return {
        reason: 'activeContent',
        message: `The PDF carries code (/${action}): print it to a new PDF and upload that.`,
      };
    }
    if (!text.slice(-PDF_EOF_WINDOW).includes('%%EOF')) {
      return malformed('The PDF has no end-of-file marker where a PDF ends');
    }
  }
  if (mediaType === 'image/png' && !bytes.subarray(-pngEnd.length).equals(pngEnd)) {
    return malformed('The file goes on after the end of its PNG image');
  }
  if (mediaType === 'image/webp' && bytes.readUInt32LE(4) + 8 !== bytes.length) {
    return malformed('The file is not as long as its WebP header says');
  }
  if (hasZipEnd(bytes)) {
    return malformed('The file has a ZIP archive inside it');
  }
  return null;
}

function malformed(what: string): HiddenContent {
  return {
    reason: 'malformed',
    message: `${what}: it may be two files in one. Save it again from the program that made it.`,
  };
}

function pdfActionIn(text: string): string | undefined {
  for (const [token] of text.matchAll(pdfName)) {
    const name = token
      .slice(1)
      .replace(/#([0-9A-Fa-f]{2})/g, (_, hex: string) => String.fromCharCode(parseInt(hex, 16)));
    if (pdfActions.has(name)) return name;
  }
  return undefined;
}

/** True when a ZIP end record sits where one ends the file: its comment runs to the last byte. */
function hasZipEnd(bytes: Buffer): boolean {
  const from = Math.max(0, bytes.length - ZIP_END_LENGTH - ZIP_COMMENT_MAX);
  let at = bytes.lastIndexOf(zipEndSignature);
  while (at >= from) {
    if (at + ZIP_END_LENGTH <= bytes.length) {
      const commentLength = bytes.readUInt16LE(at + 20);
      if (at + ZIP_END_LENGTH + commentLength === bytes.length) return true;
    }
    at = at > 0 ? bytes.lastIndexOf(zipEndSignature, at - 1) : -1;
  }
  return false;
}
