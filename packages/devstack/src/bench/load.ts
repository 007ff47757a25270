import autocannon from 'autocannon';

/** One request of a rotation: each connection sends them in turn, again and again. */
export interface RequestSpec {
  method?: 'GET' | 'POST';
  path: string;
  body?: unknown;
  headers?: Record<string, string>;
}

/** Latency percentiles in milliseconds. */
export interface Latency {
  p50: number;
  p95: number;
  p99: number;
}

export interface LoadResult extends Latency {
  requests: number;
  perSecond: number;
  /** Answers that were not 2xx, and connections that failed: a run with either is void. */
  failures: number;
  /** The statuses of the answers that were not 2xx, for the report. */
  failedStatuses: number[];
  /** Mean size of an answer, headers included. */
  bytes: number;
}

export interface LoadOptions {
  /** Measured seconds per side, in `rounds` slices. */
  seconds: number;
  rounds: number;
  /** A first run of this length per side whose figures are dropped (JIT, pools, caches). */
  warmupSeconds: number;
}

/** Nearest-rank percentile of values sorted ascending. */
export function percentile(sorted: readonly number[], p: number): number {
  if (sorted.length === 0) return Number.NaN;
  const rank = Math.ceil((p / 100) * sorted.length) - 1;
  return sorted[Math.min(sorted.length - 1, Math.max(0, rank))]!;
}

function latencyOf(samples: number[]): Latency {
  const sorted = [...samples].sort((a, b) => a - b);
  return { p50: percentile(sorted, 50), p95: percentile(sorted, 95), p99: percentile(sorted, 99) };
}

/** What one run of a load collected, before it is summed up. */
export interface Samples {
  latencies: number[];
  bytes: number;
  failures: number;
  failedStatuses: Set<number>;
  seconds: number;
}

function fire(
  baseUrl: string,
  requests: readonly RequestSpec[],
  connections: number,
  seconds: number,
): Promise<Samples> {
  const samples: Samples = {
    latencies: [],
    bytes: 0,
    failures: 0,
    failedStatuses: new Set<number>(),
    seconds,
  };
  return new Promise((resolve, reject) => {
    // One shared turn for every connection, so requests in flight at once differ (two
    // saves on one claim would only wait for each other's lock).
    let turn = 0;
    const instance = autocannon(
      {
        url: baseUrl,
        connections,
        duration: seconds,
        requests: [
          {
            setupRequest: (request) => {
              const spec = requests[turn++ % requests.length]!;
              return {
                ...request,
                method: spec.method ?? 'GET',
                path: spec.path,
                headers: {
                  ...spec.headers,
                  ...(spec.body === undefined ? {} : { 'content-type': 'application/json' }),
                },
                ...(spec.body === undefined ? {} : { body: JSON.stringify(spec.body) }),
              };
            },
          },
        ],
      },
      (error: unknown, result: autocannon.Result) => {
        if (error) return reject(error instanceof Error ? error : new Error(String(error)));
        // autocannon counts a timeout among its errors too.
        samples.failures = result.non2xx + result.errors;
        resolve(samples);
      },
    );
    instance.on('response', (_client, statusCode, resBytes, responseTime) => {
      // Only answers count; a failure is counted by autocannon and voids the run.
      if (statusCode >= 200 && statusCode < 300) {
        samples.latencies.push(responseTime);
        samples.bytes += resBytes;
      } else samples.failedStatuses.add(statusCode);
    });
  });
}

/** The figures of one or more runs of the same requests, pooled. */
function summarise(runs: readonly Samples[]): LoadResult {
  const latencies = runs.flatMap((run) => run.latencies);
  const seconds = runs.reduce((sum, run) => sum + run.seconds, 0);
  const bytes = runs.reduce((sum, run) => sum + run.bytes, 0);
  return {
    ...latencyOf(latencies),
    requests: latencies.length,
    perSecond: latencies.length / seconds,
    failures: runs.reduce((sum, run) => sum + run.failures, 0),
    failedStatuses: [...new Set(runs.flatMap((run) => [...run.failedStatuses]))],
    bytes: latencies.length ? bytes / latencies.length : 0,
  };
}

/** One side of a comparison: runs its load for so many seconds, at its connections. */
export type Runner = (seconds: number) => Promise<Samples>;

/**
 * Requests to the API, driven with autocannon from this process over loopback, as a side
 * of `loadInTurns`. Latency is from sending a request to its last byte; over loopback and
 * in one write (as Express sends a page), that is the time to first byte plus microseconds.
 */
export const httpRunner =
  (baseUrl: string, requests: readonly RequestSpec[], connections: number): Runner =>
  (seconds) =>
    fire(baseUrl, requests, connections, seconds);

/**
 * Loads measured in turns (a path, its reference, a path, its reference …, in `rounds`
 * slices of the run's length each), each one's slices pooled. The machine's neighbours
 * take a share of its cores that comes and goes within a minute; measured one after the
 * other, either side could get the quiet stretch and the ratio would swing with it.
 */
export async function loadInTurns<Sides extends readonly Runner[]>(
  sides: readonly [...Sides],
  options: LoadOptions,
): Promise<{ [K in keyof Sides]: LoadResult }> {
  for (const run of sides) await run(options.warmupSeconds);
  const runs = sides.map((): Samples[] => []);
  const slice = options.seconds / options.rounds;
  for (let round = 0; round < options.rounds; round += 1) {
    for (const [side, run] of sides.entries()) runs[side]!.push(await run(slice));
  }
  return runs.map(summarise) as { [K in keyof Sides]: LoadResult };
}
