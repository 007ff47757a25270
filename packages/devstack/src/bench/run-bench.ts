import { join } from 'node:path';
import * as mariadb from '../mariadb.js';
import { repoRoot } from '../paths.js';
import { Cleanups, startBenchStack } from './bench-stack.js';
import { buildIfNeeded } from './build.js';
import { Measurements } from './measurements.js';
import { benchPlans, type BenchPlan } from './plan.js';
import {
  currentCommit,
  datasetLine,
  formatTable,
  machine,
  markdownFile,
  notesOf,
  resultsFile,
  writeReport,
  type BenchRow,
} from './report.js';

/**
 * `npm run bench` / `npm run bench:quick`: builds what is stale, fills a database of its
 * own, starts the built API and measures every hot path beside its reference in the same
 * run; prints the table and writes bench/results/latest.json. Exits 0 when the run
 * completes, whatever the figures: the table says which goals were met.
 */
export async function runBench(mode: BenchPlan['mode']): Promise<number> {
  const plan = benchPlans[mode];
  const began = Date.now();
  const cleanups = new Cleanups();
  for (const signal of ['SIGINT', 'SIGTERM'] as const) {
    process.on(signal, () => {
      console.info('\nStopping the benchmark...');
      void cleanups.run().then(() => process.exit(130));
    });
  }
  try {
    if (await mariadb.start()) cleanups.add(() => mariadb.stop());
    const { deskBuilt } = buildIfNeeded();
    const stack = await startBenchStack(plan, cleanups);
    const measure = new Measurements(stack, plan);
    const rows: BenchRow[] = [];
    const step = async (title: string, measured: () => Promise<BenchRow | BenchRow[]>) => {
      console.info(`▸ Measuring ${title}`);
      rows.push(...[await measured()].flat());
    };
    await step('the queue and the claim page', () => measure.desk());
    await step('search and similar claims against SQL', () => measure.search());
    await step('reader pages against static files', () => measure.reader());
    await step('saving a working', () => measure.workings());
    await step('cold start, memory and the desk bundle', () =>
      measure.footprint(deskBuilt ? join(repoRoot, 'apps/web/dist') : null),
    );
    writeReport({
      date: new Date().toISOString(),
      mode,
      commit: currentCommit(),
      ...machine(),
      dataset: stack.dataset,
      rows,
    });
    const met = rows.filter((row) => row.pass).length;
    const notes = notesOf(rows).map((note) => `  ${note}`);
    console.info(`\n${formatTable(rows)}\n\nNotes:\n${notes.join('\n')}`);
    console.info(
      `\n${met} of ${rows.length} rows meet their goal (${mode} run, ${datasetLine(stack.dataset)}; ` +
        `${machine().cores} cores, Node ${process.version}, ${Math.round((Date.now() - began) / 1000)} s). Written to ${resultsFile} and ${markdownFile}.`,
    );
    return 0;
  } finally {
    await cleanups.run();
  }
}
