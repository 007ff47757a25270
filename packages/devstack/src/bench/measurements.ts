import { mkdirSync, readFileSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { type BenchStack } from './bench-stack.js';
import { httpRunner, loadInTurns, type LoadResult, type RequestSpec, type Runner } from './load.js';
import { connections, type BenchPlan } from './plan.js';
import { type BenchRow } from './report.js';
import {
  deskQueries,
  similarQueries,
  similarTypoQueries,
  typoQueries,
  type TypoCase,
} from './search-cases.js';
import { deskFirstRoute, gzipSize, stylesheetsOf } from './sizes.js';
import {
  idsOf,
  statementsRunner,
  searchStatement,
  similarStatement,
  typoRecall,
  type SqlEngine,
  type Statement,
} from './sql-reference.js';

const engines: SqlEngine[] = ['like', 'fulltext'];
const engineNames: Record<SqlEngine, string> = { like: 'LIKE', fulltext: 'FULLTEXT' };

/** A run that had failures proves nothing: its row fails and says why. */
const failureNote = (...runs: LoadResult[]) => {
  const failed = runs.filter((run) => run.failures > 0);
  return failed.length
    ? `${failed.map((run) => `${run.failures} failed (${run.failedStatuses.join(', ') || 'no answer'})`).join('; ')}`
    : undefined;
};

function latencyRow(
  path: string,
  measured: LoadResult,
  reference: { name: string; run: LoadResult },
  goal: { text: string; pass: (ratio: number, p95: number) => boolean },
  figure: string,
): BenchRow {
  const ratio = measured.p95 / reference.run.p95;
  const note = failureNote(measured, reference.run);
  return {
    path,
    figure,
    value: measured.p95,
    unit: 'ms',
    reference: { name: reference.name, value: reference.run.p95 },
    ratio,
    goal: goal.text,
    pass: !note && goal.pass(ratio, measured.p95),
    ...(note ? { note } : {}),
  };
}

/** The measurements of one run: each path beside its reference, in the same minutes. */
export class Measurements {
  constructor(
    private readonly stack: BenchStack,
    private readonly plan: BenchPlan,
  ) {}

  /** Loads measured in turns with their references (`loadInTurns`). */
  private runInTurns<Sides extends readonly Runner[]>(sides: readonly [...Sides]) {
    return loadInTurns(sides, {
      seconds: this.plan.seconds,
      warmupSeconds: this.plan.warmupSeconds,
      rounds: this.plan.rounds,
    });
  }

  /** Requests to the API measured in turns with their references, all at `connections`. */
  private inTurns<Sides extends ReadonlyArray<readonly RequestSpec[]>>(
    sides: readonly [...Sides],
    connections: number,
  ) {
    return this.runInTurns(
      sides.map((requests) => httpRunner(this.stack.baseUrl, requests, connections)),
    ) as Promise<{ [K in keyof Sides]: LoadResult }>;
  }

  private get(path: string): RequestSpec {
    return { path, headers: this.stack.headers };
  }

  /**
   * The queue at the desk's throughput (32 connections, as the issue sets it) and the claim
   * page at the latency connections, each against the trivial route at the same.
   */
  async desk(): Promise<BenchRow[]> {
    const ping = [{ path: '/api/bench/ping' }];
    // With the floor under any signed-in route (the token, the account's status): the
    // trivial route behind the sign-in. The queue's reference does no sign-in at all.
    const [queue, pinged, signedIn] = await this.inTurns(
      [
        [
          'status=in_research&topic=solar&sort=updatedAt&order=desc',
          'status=published&topic=sea-level&sort=filedAt&order=desc',
          'status=awaiting_signoff&legal=false&sort=summary&order=asc',
        ].map((filters) => this.get(`/api/claims?${filters}&pageSize=25`)),
        ping,
        [this.get('/api/bench/signed-in-ping')],
      ],
      connections.throughput,
    );
    const reference = { name: 'trivial JSON route', run: pinged };
    const throughput = queue.perSecond / reference.run.perSecond;
    const queueFailures = failureNote(queue, reference.run);
    const floor =
      failureNote(signedIn) ??
      `the trivial route signed in (token checked, account read), ${Math.round(signedIn.perSecond)} req/s ` +
        `(${(signedIn.perSecond / reference.run.perSecond).toFixed(2)}×), p95 ${signedIn.p95.toFixed(1)} ms`;
    const [claimPage, claimPinged] = await this.inTurns(
      [this.stack.samples.claimIds.map((id) => this.get(`/api/claims/${id}`)), ping],
      connections.latency,
    );
    const claimReference = { name: reference.name, run: claimPinged };
    const figure = `p95, ${connections.throughput} connections`;
    return [
      latencyRow(
        'queue page (25 rows, 2 filters, sorted)',
        queue,
        reference,
        { text: 'p95 ≤ 30 ms', pass: (_ratio, p95) => p95 <= 30 },
        figure,
      ),
      {
        path: 'queue page (25 rows, 2 filters, sorted)',
        figure: `throughput, ${connections.throughput} connections`,
        value: queue.perSecond,
        unit: 'req/s',
        reference: { name: reference.name, value: reference.run.perSecond },
        ratio: throughput,
        goal: '≥ 0.4× reference',
        pass: !queueFailures && throughput >= 0.4,
        note: queueFailures ? `${queueFailures}; ${floor}` : floor,
      },
      latencyRow(
        'claim page API (claim with all its parts)',
        claimPage,
        claimReference,
        { text: 'p95 ≤ 40 ms', pass: (_ratio, p95) => p95 <= 40 },
        `p95, ${connections.latency} connections`,
      ),
    ];
  }

  /** One search path (desk search or similar claims) against LIKE and FULLTEXT. */
  private async searchRows(
    path: string,
    request: (query: string) => string,
    statement: (engine: SqlEngine, query: string) => Statement,
    queries: { speed: readonly string[]; typos: readonly TypoCase[]; depth: number },
    pageIds: (body: unknown) => string[],
  ): Promise<BenchRow[]> {
    const [api, ...sql] = await this.runInTurns([
      httpRunner(
        this.stack.baseUrl,
        queries.speed.map((query) => this.get(request(query))),
        connections.latency,
      ),
      ...engines.map((engine) =>
        statementsRunner(
          this.stack.pool,
          queries.speed.map((query) => statement(engine, query)),
          connections.latency,
        ),
      ),
    ]);
    const rows: BenchRow[] = [];
    for (const [index, engine] of engines.entries()) {
      const limit = engine === 'like' ? 0.1 : 1;
      rows.push(
        latencyRow(
          path,
          api!,
          { name: engineNames[engine], run: sql[index]! },
          {
            text: engine === 'like' ? 'p95 ≤ 0.1× LIKE' : 'p95 ≤ 1× FULLTEXT and ≤ 20 ms',
            pass: (ratio, p95) => ratio <= limit && (engine === 'like' || p95 <= 20),
          },
          `p95, ${connections.latency} connections`,
        ),
      );
    }
    const recall = async (found: (query: string) => Promise<string[]>) =>
      100 * (await typoRecall(this.stack.pool, queries.typos, queries.depth, found));
    const apiRecall = await recall(async (query) => {
      const response = await fetch(`${this.stack.baseUrl}${request(query)}`, {
        headers: this.stack.headers,
      });
      return response.ok ? pageIds(await response.json()) : [];
    });
    const sqlRecall = await Promise.all(
      engines.map((engine) => recall((query) => idsOf(this.stack.pool, statement(engine, query)))),
    );
    const best = Math.max(...sqlRecall);
    rows.push({
      path,
      figure: `typo recall, ${queries.typos.length} misspelled, first ${queries.depth}`,
      value: apiRecall,
      unit: '%',
      reference: {
        name: engines
          .map((engine, index) => `${engineNames[engine]} ${sqlRecall[index]!.toFixed(0)} %`)
          .join(', '),
        value: best,
      },
      ratio: null,
      goal: 'above both',
      pass: apiRecall > best,
    });
    return rows;
  }

  async search(): Promise<BenchRow[]> {
    const ids = (body: unknown) =>
      (body as { items: Array<{ id: string }> }).items.map((hit) => hit.id);
    return [
      ...(await this.searchRows(
        'desk search (claims)',
        (q) => `/api/search?${new URLSearchParams({ q, type: 'claim' })}`,
        searchStatement,
        { speed: deskQueries, typos: typoQueries, depth: 20 },
        ids,
      )),
      ...(await this.searchRows(
        'similar claims',
        (text) => `/api/claims/similar?${new URLSearchParams({ text })}`,
        similarStatement,
        // The closest claim must be the one meant: its words are all there but one.
        { speed: similarQueries, typos: similarTypoQueries, depth: 1 },
        (body) => (body as Array<{ id: string }>).map((claim) => claim.id),
      )),
    ];
  }

  /**
   * Copies of reader pages as static files in the served folder, byte for byte, so the
   * same server answers the same sizes from disk.
   */
  private async staticTwins(paths: readonly string[], name: string): Promise<string[]> {
    const folder = join(this.stack.webDir, 'bench-static');
    mkdirSync(folder, { recursive: true });
    return Promise.all(
      paths.map(async (path, index) => {
        const response = await fetch(`${this.stack.baseUrl}${path}`);
        if (!response.ok) throw new Error(`${path} answered ${response.status}`);
        const file = `${name}-${index}.html`;
        writeFileSync(join(folder, file), Buffer.from(await response.arrayBuffer()));
        return `/bench-static/${file}`;
      }),
    );
  }

  private async readerRow(path: string, pages: readonly string[], name: string, limit: number) {
    const twins = await this.staticTwins(pages, name);
    const [page, file] = await this.inTurns(
      [pages.map((page) => ({ path: page })), twins.map((twin) => ({ path: twin }))],
      connections.latency,
    );
    return latencyRow(
      path,
      page,
      { name: 'static file, same size', run: file },
      { text: `TTFB p95 ≤ ${limit}× static`, pass: (ratio) => ratio <= limit },
      `TTFB p95, ${connections.latency} connections`,
    );
  }

  /** Reader pages against static files of the same size, and what a reader downloads. */
  async reader(): Promise<BenchRow[]> {
    const explainers = this.stack.samples.slugs.map((slug) => `/explainers/${slug}`);
    const rows = [
      await this.readerRow('reader explainer page (server-rendered)', explainers, 'explainer', 1.5),
      await this.readerRow('Atom feed', ['/feeds/explainers.atom'], 'feed', 2),
      await this.readerRow(
        'explainer index',
        Array.from({ length: 10 }, (_, index) => `/explainers?page=${index + 1}`),
        'index',
        2,
      ),
    ];
    // What a phone downloads for the largest sampled page: its HTML and its stylesheets.
    let largest = { path: '', html: Buffer.alloc(0) };
    for (const path of explainers) {
      const html = Buffer.from(await (await fetch(`${this.stack.baseUrl}${path}`)).arrayBuffer());
      if (html.length > largest.html.length) largest = { path, html };
    }
    const css = await Promise.all(
      stylesheetsOf(largest.html.toString('utf8')).map(async (href) =>
        Buffer.from(await (await fetch(new URL(href, this.stack.baseUrl))).arrayBuffer()),
      ),
    );
    const transfer =
      (gzipSize(largest.html) + css.reduce((sum, sheet) => sum + gzipSize(sheet), 0)) / 1024;
    rows.push({
      path: 'reader page transfer size',
      figure: 'HTML + CSS, gzip',
      value: transfer,
      unit: 'KB',
      reference: null,
      ratio: null,
      goal: '≤ 60 KB',
      pass: transfer <= 60,
      note: `largest of ${explainers.length} sampled pages: ${(largest.html.length / 1024).toFixed(1)} KB of HTML before gzip`,
    });
    rows.push(await this.revalidation(largest.path));
    return rows;
  }

  /** A reader's browser asking again with the ETag it holds gets a 304, and may cache. */
  private async revalidation(path: string): Promise<BenchRow> {
    const url = `${this.stack.baseUrl}${path}`;
    const first = await fetch(url);
    await first.arrayBuffer();
    const etag = first.headers.get('etag');
    // As a browser revalidates its copy; fetch() itself would add `no-cache`, which Express
    // rightly answers in full.
    const again = await fetch(url, {
      headers: { 'cache-control': 'max-age=0', ...(etag ? { 'if-none-match': etag } : {}) },
    });
    const cacheControl = first.headers.get('cache-control') ?? '';
    const pass = etag !== null && again.status === 304 && cacheControl !== '';
    return {
      path: 'reader page revalidation',
      figure: 'GET with If-None-Match',
      value: again.status,
      unit: 'status',
      reference: null,
      ratio: null,
      goal: '304, with ETag and Cache-Control',
      pass,
      note: `Cache-Control: ${cacheControl || '(none)'}`,
    };
  }

  /** Saving a working (the server's recomputation included) against the calculator run alone. */
  async workings(): Promise<BenchRow> {
    const inputs = { inputs: {} };
    const [save, run] = await this.inTurns(
      [
        this.stack.samples.researchIds.map((id) => ({
          method: 'POST' as const,
          path: `/api/claims/${id}/workings`,
          headers: this.stack.headers,
          body: { calculatorId: 'energy-balance', ...inputs },
        })),
        [{ method: 'POST', path: '/api/calculators/energy-balance/run', body: inputs }],
      ],
      connections.latency,
    );
    const overhead = save.p95 - run.p95;
    const note = failureNote(save, run);
    return {
      path: 'saving a working (server recompute)',
      figure: `p95, ${connections.latency} connections`,
      value: save.p95,
      unit: 'ms',
      reference: { name: 'the calculator run alone', value: run.p95 },
      ratio: overhead,
      goal: 'overhead ≤ 20 ms',
      pass: !note && overhead <= 20,
      note: note ?? `p50 ${save.p50.toFixed(1)} ms against ${run.p50.toFixed(1)} ms`,
    };
  }

  /** Cold start, memory after the run, and the desk's first-route JavaScript. */
  async footprint(deskDist: string | null): Promise<BenchRow[]> {
    const { health, firstSearch } = this.stack.coldStart;
    const status = readFileSync(`/proc/${this.stack.api.pid}/status`, 'utf8');
    const kilobytes = (field: string) =>
      Number(new RegExp(`${field}:\\s+(\\d+) kB`).exec(status)?.[1] ?? NaN);
    const rss = kilobytes('VmRSS') / 1024;
    const rows: BenchRow[] = [
      {
        path: `cold start with ${this.stack.dataset.claims!.toLocaleString('en-GB')} claims (search index built)`,
        figure: 'spawn → health → first search',
        value: firstSearch,
        unit: 's',
        reference: null,
        ratio: null,
        goal: '≤ 20 s',
        pass: firstSearch <= 20,
        note: `health answered after ${health.toFixed(1)} s`,
      },
      {
        path: 'memory of the API process after the run',
        figure: 'RSS',
        value: rss,
        unit: 'MB',
        reference: null,
        ratio: null,
        goal: '≤ 512 MB',
        pass: rss <= 512,
        note: `peak ${(kilobytes('VmHWM') / 1024).toFixed(0)} MB`,
      },
    ];
    const bundle = deskDist ? await deskFirstRoute(deskDist) : null;
    rows.push(
      bundle
        ? {
            path: 'desk first-route JavaScript',
            figure: 'entry + sign-in chunks, gzip',
            value: bundle.gzip / 1024,
            unit: 'KB',
            reference: null,
            ratio: null,
            goal: '≤ 200 KB',
            pass: bundle.gzip / 1024 <= 200,
            note: `${bundle.chunks.length} chunks`,
          }
        : {
            path: 'desk first-route JavaScript',
            figure: 'entry + sign-in chunks, gzip',
            value: Number.NaN,
            unit: 'KB',
            reference: null,
            ratio: null,
            goal: '≤ 200 KB',
            pass: false,
            note: 'not measured: the desk did not build',
          },
    );
    return rows;
  }
}
