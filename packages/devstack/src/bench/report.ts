import { spawnSync } from 'node:child_process';
import { mkdirSync, writeFileSync } from 'node:fs';
import { availableParallelism, cpus } from 'node:os';
import { join } from 'node:path';
import { repoRoot } from '../paths.js';

/** One line of the table: a figure, beside its reference measured in the same run. */
export interface BenchRow {
  path: string;
  /** What was measured, e.g. `p95 latency, 32 connections`. */
  figure: string;
  value: number;
  unit: string;
  /** The reference in the same unit, or null for an absolute limit. */
  reference: { name: string; value: number } | null;
  /** value / reference (or value − reference for an overhead): what the goal judges. */
  ratio: number | null;
  goal: string;
  pass: boolean;
  note?: string;
}

export interface BenchReport {
  date: string;
  mode: 'full' | 'quick';
  commit: string;
  node: string;
  cores: number;
  cpu: string;
  dataset: Record<string, number>;
  rows: BenchRow[];
}

export const resultsFile = join(repoRoot, 'bench/results/latest.json');
/** The same run as a Markdown table with its machine, as README.md's performance section shows it. */
export const markdownFile = join(repoRoot, 'bench/results/latest.md');

function git(args: string[]): string {
  const result = spawnSync('git', args, { cwd: repoRoot, encoding: 'utf8' });
  return result.status === 0 ? result.stdout.trim() : '';
}

/** The checked-out commit, marked when the working tree has changes on top of it. */
export function currentCommit(): string {
  const commit = git(['rev-parse', '--short=12', 'HEAD']) || 'unknown';
  return git(['status', '--porcelain']) ? `${commit}+changes` : commit;
}

export function machine(): Pick<BenchReport, 'node' | 'cores' | 'cpu'> {
  return { node: process.version, cores: availableParallelism(), cpu: cpus()[0]?.model ?? '' };
}

const number = (value: number) =>
  !Number.isFinite(value)
    ? '—'
    : Math.abs(value) >= 100
      ? Math.round(value).toLocaleString('en-GB')
      : Math.abs(value) >= 10
        ? value.toFixed(1)
        : value.toFixed(2);

const withUnit = (value: number, unit: string) =>
  unit === '%' ? `${number(value)} %` : `${number(value)} ${unit}`;

/** The rows as text columns, also what the README's performance section shows. */
export function tableLines(rows: readonly BenchRow[]): string[][] {
  return rows.map((row) => [
    row.path,
    row.figure,
    withUnit(row.value, row.unit),
    row.reference ? `${withUnit(row.reference.value, row.unit)} (${row.reference.name})` : '—',
    row.ratio === null
      ? '—'
      : row.goal.includes('overhead')
        ? withUnit(row.ratio, row.unit)
        : `${number(row.ratio)}×`,
    row.goal,
    row.pass ? 'pass' : 'FAIL',
  ]);
}

export const tableHeader = [
  'path',
  'figure',
  'measured',
  'reference (same run)',
  'ratio',
  'goal',
  'result',
];

/** A plain table for the console, columns padded to their widest cell. */
export function formatTable(rows: readonly BenchRow[]): string {
  const lines = [tableHeader, ...tableLines(rows)];
  const widths = tableHeader.map((_, column) =>
    Math.max(...lines.map((line) => line[column]!.length)),
  );
  const render = (line: string[]) =>
    line
      .map((cell, column) => cell.padEnd(widths[column]!))
      .join('  ')
      .trimEnd();
  return [
    render(lines[0]!),
    widths.map((width) => '─'.repeat(width)).join('  '),
    ...lines.slice(1).map(render),
  ].join('\n');
}

/** The same table in Markdown, for the README. */
export function markdownTable(rows: readonly BenchRow[]): string {
  const line = (cells: string[]) =>
    `| ${cells.map((cell) => cell.replace(/\|/g, '\\|')).join(' | ')} |`;
  return [
    line(tableHeader),
    line(tableHeader.map(() => '---')),
    ...tableLines(rows).map(line),
  ].join('\n');
}

/** The rows' notes, each after its path and figure. */
export const notesOf = (rows: readonly BenchRow[]) =>
  rows.filter((row) => row.note).map((row) => `${row.path}, ${row.figure}: ${row.note}`);

/** What the run measured on, e.g. `100,000 claims, 5,000 published explainers`. */
export const datasetLine = (dataset: Record<string, number>) =>
  Object.entries(dataset)
    .map(([name, count]) => `${count.toLocaleString('en-GB')} ${name}`)
    .join(', ');

export function writeReport(report: BenchReport): void {
  mkdirSync(join(repoRoot, 'bench/results'), { recursive: true });
  writeFileSync(resultsFile, `${JSON.stringify(report, null, 2)}\n`);
  writeFileSync(
    markdownFile,
    `${report.mode} run of ${report.date.slice(0, 16).replace('T', ' ')} UTC, commit ${report.commit}: ` +
      `${report.cores} cores (${report.cpu}), Node ${report.node}; ${datasetLine(report.dataset)}.\n\n` +
      `${markdownTable(report.rows)}\n\nNotes:\n\n${notesOf(report.rows)
        .map((note) => `- ${note}`)
        .join('\n')}\n`,
  );
}
