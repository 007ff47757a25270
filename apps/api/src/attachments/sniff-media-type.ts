import { type AttachmentMediaType } from '@skyledger/contracts';
import { parse } from 'csv-parse/sync';
import { fileTypeFromBuffer } from 'file-type';
import { readFile } from 'node:fs/promises';
import { extname } from 'node:path';
import { findHiddenContent } from './hidden-content';

/** What the bytes are, or why the desk refuses them. */
export type SniffResult =
  | { accepted: true; mediaType: AttachmentMediaType }
  | {
      accepted: false;
      reason: 'unsupportedType' | 'typeMismatch' | 'activeContent' | 'malformed';
      message: string;
    };

const binaryTypes: Partial<Record<string, AttachmentMediaType>> = {
  'application/pdf': 'application/pdf',
  'image/png': 'image/png',
  'image/jpeg': 'image/jpeg',
  'image/webp': 'image/webp',
};

/** The extensions a name may carry for each type; a name with another known one is refused. */
export const extensionsOf: Record<AttachmentMediaType, readonly string[]> = {
  'application/pdf': ['.pdf'],
  'image/png': ['.png'],
  'image/jpeg': ['.jpg', '.jpeg'],
  'image/webp': ['.webp'],
  'text/csv': ['.csv', '.txt'],
  'text/plain': ['.txt', '.csv', '.text', '.md'],
};
const knownExtensions = new Set(Object.values(extensionsOf).flat());

const accepted = 'The desk takes PDF, PNG, JPEG, WebP, CSV and plain-text files';

/**
 * Reads the type of an upload from its bytes, never from its name: the binary formats by
 * their signatures (file-type), text as strict UTF-8 without control characters, and CSV
 * as text whose first lines parse into records of one width. A name whose extension says
 * another accepted type is refused too: it is a file in disguise; so is a file that carries
 * markup, script or a second file besides what its type says (see hidden-content.ts).
 */
export async function sniffMediaType(path: string, originalName: string): Promise<SniffResult> {
  const bytes = await readFile(path);
  const detected = await fileTypeFromBuffer(bytes);
  const extension = extname(originalName).toLowerCase();
  let mediaType: AttachmentMediaType | undefined;
  if (detected) {
    mediaType = binaryTypes[detected.mime];
    if (!mediaType) {
      return {
        accepted: false,
        reason: 'unsupportedType',
        message: `The file is ${detected.mime} (.${detected.ext}). ${accepted}.`,
      };
    }
  } else {
    const text = decodeText(bytes);
    if (text === null) {
      return {
        accepted: false,
        reason: 'unsupportedType',
        message: `The file is not a recognised format. ${accepted}.`,
      };
    }
    mediaType = looksLikeCsv(text, extension === '.csv') ? 'text/csv' : 'text/plain';
  }
  if (knownExtensions.has(extension) && !extensionsOf[mediaType].includes(extension)) {
    return {
      accepted: false,
      reason: 'typeMismatch',
      message: `The name ends in ${extension} but the file is ${mediaType}: rename it or upload the real file.`,
    };
  }
  const hidden = findHiddenContent(bytes, mediaType);
  if (hidden) return { accepted: false, ...hidden };
  return { accepted: true, mediaType };
}

/** The text of strict UTF-8 bytes (BOM dropped), or null if they are not text. */
function decodeText(bytes: Buffer): string | null {
  let text: string;
  try {
    text = new TextDecoder('utf-8', { fatal: true, ignoreBOM: false }).decode(bytes);
  } catch {
    return null;
  }
  // Tab, line feed, form feed and carriage return are text; other C0 controls and DEL are not.
  // eslint-disable-next-line no-control-regex
  return /[\u0000-\u0008\u000B\u000E-\u001F\u007F]/.test(text) ? null : text;
}

function looksLikeCsv(text: string, namedCsv: boolean): boolean {
  try {
    const records = parse(text, { to_line: 200, skip_empty_lines: true }) as string[][];
    const width = records[0]?.length ?? 0;
    // A one-column table is CSV only when its name says so; otherwise it is just lines.
    return namedCsv ? records.length >= 1 : records.length >= 2 && width >= 2;
  } catch {
    return false;
  }
}

/**
 * Characters that are never part of a name: C0 and C1 controls, line and paragraph
 * separators, and the bidirectional controls that let `report\u202Egnp.exe` show as
 * `reportexe.png` (Unicode Standard Annex #9, section 2, and Unicode Technical Report #36, 2.3).
 */
// eslint-disable-next-line no-control-regex
const unsafeInNames = /[\u0000-\u001F\u007F-\u009F\u061C\u200E\u200F\u2028-\u202E\u2066-\u2069]/g;
const NAME_MAX_CHARACTERS = 255;

/** The name to keep: any folders dropped, unsafe characters removed, the right extension. */
export function safeOriginalName(name: string, mediaType: AttachmentMediaType): string {
  const base = (name.split(/[\\/]/).pop() ?? '').replace(unsafeInNames, '').trim();
  const extensions = extensionsOf[mediaType];
  const named = base === '' || base === '.' || base === '..' ? 'file' : base;
  const withExtension = extensions.includes(extname(named).toLowerCase())
    ? named
    : `${named}${extensions[0]}`;
  // Cut by characters, not UTF-16 units, so no character is split; the end keeps the extension.
  const characters = Array.from(withExtension);
  return characters.length > NAME_MAX_CHARACTERS
    ? characters.slice(-NAME_MAX_CHARACTERS).join('')
    : withExtension;
}
