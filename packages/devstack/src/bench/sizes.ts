import { init, parse } from 'es-module-lexer';
import { existsSync, readFileSync } from 'node:fs';
import { join, posix } from 'node:path';
import { gzipSync } from 'node:zlib';

export const gzipSize = (bytes: Buffer | string) => gzipSync(bytes).length;

/** A chunk's imports, split into those it loads at once and those it loads on demand. */
function importsOf(dist: string, file: string): { now: string[]; later: string[] } {
  const source = readFileSync(join(dist, file), 'utf8');
  const [imports] = parse(source);
  const resolved = (specifier: string) => posix.join(posix.dirname(file), specifier);
  const relative = imports.filter((entry) => entry.n?.startsWith('.'));
  return {
    now: relative.filter((entry) => entry.d === -1).map((entry) => resolved(entry.n!)),
    later: relative.filter((entry) => entry.d > -1).map((entry) => resolved(entry.n!)),
  };
}

/** The chunks `file` needs before it runs: itself and what it imports, transitively. */
function staticClosure(dist: string, file: string, into = new Set<string>()): Set<string> {
  if (into.has(file)) return into;
  into.add(file);
  for (const next of importsOf(dist, file).now) staticClosure(dist, next, into);
  return into;
}

export interface DeskBundle {
  /** The chunks a first visit to the sign-in page runs, with the gzip size of each. */
  chunks: Array<{ file: string; gzip: number }>;
  gzip: number;
}

/**
 * The JavaScript of the desk's first route, from its build: the entry chunk of
 * index.html and what it imports, then the sign-in route's lazy chunk (the route every
 * visit starts on) and what that imports, each gzipped on its own as a server would.
 */
export async function deskFirstRoute(dist: string): Promise<DeskBundle | null> {
  const indexHtml = join(dist, 'index.html');
  if (!existsSync(indexHtml)) return null;
  await init;
  const entry = /<script type="module"[^>]*src="\/([^"]+)"/.exec(
    readFileSync(indexHtml, 'utf8'),
  )?.[1];
  if (!entry) return null;
  const files = staticClosure(dist, entry);
  const signIn = [...files]
    .flatMap((file) => importsOf(dist, file).later)
    .find((file) => /(^|\/)sign-in-[\w-]+\.js$/.test(file));
  if (signIn) staticClosure(dist, signIn, files);
  const chunks = [...files].map((file) => ({
    file,
    gzip: gzipSize(readFileSync(join(dist, file))),
  }));
  return { chunks, gzip: chunks.reduce((sum, chunk) => sum + chunk.gzip, 0) };
}

/** The stylesheets a page links to, as paths on its server. */
export function stylesheetsOf(html: string): string[] {
  return [...html.matchAll(/<link[^>]+rel="stylesheet"[^>]*>/g)].flatMap(
    (tag) => /href="([^"]+)"/.exec(tag[0])?.slice(1) ?? [],
  );
}
