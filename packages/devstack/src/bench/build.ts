import { existsSync, readdirSync, statSync } from 'node:fs';
import { join } from 'node:path';
import { repoRoot } from '../paths.js';
import { npmCommand, runStep, StepFailedError } from '../processes.js';

const skipped = new Set(['node_modules', 'dist', 'coverage', 'test-results']);

/** The newest modification time of the files under `path`, build output left out. */
function newest(path: string): number {
  if (!existsSync(path)) return 0;
  const stat = statSync(path);
  if (!stat.isDirectory()) return stat.mtimeMs;
  return Math.max(
    0,
    ...readdirSync(path)
      .filter((name) => !skipped.has(name))
      .map((name) => newest(join(path, name))),
  );
}

const packages = ['packages/contracts', 'packages/explainer', 'calc-library'];
const sourcesOf = (workspace: string) => [`${workspace}/src`, `${workspace}/package.json`];

/** What the benchmark runs, in build order: each built when a source is newer than its output. */
const builds = [
  ...[...packages, 'apps/api'].map((workspace) => ({
    workspace,
    inputs: sourcesOf(workspace),
    required: true,
  })),
  {
    workspace: 'apps/web',
    // The desk bundles the packages from their sources.
    inputs: [
      ...sourcesOf('apps/web'),
      'apps/web/index.html',
      'apps/web/public',
      'apps/web/vite.config.ts',
      ...packages.flatMap(sourcesOf),
    ],
    required: false,
  },
];

/**
 * Builds what is missing or older than its sources. The API must build; a desk that does
 * not (it is often mid-edit) only leaves its bundle row unmeasured. Returns whether the
 * desk's build is there.
 */
export function buildIfNeeded(): { deskBuilt: boolean } {
  let deskBuilt = true;
  for (const { workspace, inputs, required } of builds) {
    const built = newest(join(repoRoot, workspace, 'dist'));
    const changed = Math.max(...inputs.map((input) => newest(join(repoRoot, input))));
    if (built >= changed) continue;
    try {
      runStep(`Building ${workspace}`, npmCommand, ['run', 'build', '-w', workspace]);
    } catch (error) {
      if (required || !(error instanceof StepFailedError)) throw error;
      console.warn(`  ${workspace} did not build: its row is left unmeasured.`);
      deskBuilt = false;
    }
  }
  return { deskBuilt };
}
