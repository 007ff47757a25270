import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';

export const repoRoot = join(dirname(fileURLToPath(import.meta.url)), '../../..');
/** Everything the dev stack writes lives here; the folder is git-ignored. */
export const dataDir = join(repoRoot, '.data');
/** Scratch space for test runs (browser profiles, reports); git-ignored. */
export const tmpDir = join(repoRoot, 'tmp');
