import { createHash } from 'node:crypto';
import { readFileSync } from 'node:fs';
import { join } from 'node:path';

// Comments and layout whitespace dropped; a run of spaces inside a value stays one space.
const css = readFileSync(join(__dirname, 'reader.css'), 'utf8')
  .replace(/\/\*[\s\S]*?\*\//g, '')
  .replace(/\s+/g, ' ')
  .replace(/\s*([{};])\s*/g, '$1')
  .trim();

/**
 * The reader pages' stylesheet with a content hash in its path, so the controller can
 * serve it with a year-long cache and a change of the sheet changes the address.
 * Fonts: the system serif and sans stacks, so no font file is downloaded.
 */
export const readerStylesheet: { path: string; css: string } = {
  path: `/reader/reader.${createHash('sha256').update(css).digest('hex').slice(0, 10)}.css`,
  css,
};
