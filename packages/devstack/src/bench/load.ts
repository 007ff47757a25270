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
  connections: number;
  seconds: number;
  /** A first run of this length whose figures are dropped (JIT, pools, caches). */
  warmupSeconds: number;
}

/** Nearest-rank percentile of values sorted ascending. */
export function percentile(sorted: readonly number[], p: number): number {
  if (sorted.length === 0) return Number.NaN;
  const rank = Math.ceil((p / 100) * sorted.length) - 1;
  return sorted[Math.min(sorted.length - 1, Math.max(0, rank))]!;
}

export function latencyOf(samples: number[]): Latency {
  const sorted = [...samples].sort((a, b) => a - b);
  return { p50: percentile(sorted, 50), p95: percentile(sorted, 95), p99: percentile(sorted, 99) };
}

function fire(
  baseUrl: string,
  requests: readonly RequestSpec[],
  connections: number,
  seconds: number,
): Promise<LoadResult> {
  const latencies: number[] = [];
  const failedStatuses = new Set<number>();
  let bytes = 0;
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
        resolve({
          ...latencyOf(latencies),
          requests: latencies.length,
          perSecond: latencies.length / seconds,
          // autocannon counts a timeout among its errors too.
          failures: result.non2xx + result.errors,
          failedStatuses: [...failedStatuses],
          bytes: latencies.length ? bytes / latencies.length : 0,
        });
      },
    );
    instance.on('response', (_client, statusCode, resBytes, responseTime) => {
      // Only answers count; a failure is counted by autocannon and voids the run.
      if (statusCode >= 200 && statusCode < 300) {
        latencies.push(responseTime);
        bytes += resBytes;
      } else failedStatuses.add(statusCode);
    });
  });
}

/**
 * Drives the API with autocannon from this process over loopback: a warm-up, then the
 * measured run. Latency is from sending a request to its last byte; over loopback and in
 * one write (as Express sends a page), that is the time to first byte plus microseconds.
 */
export async function load(
  baseUrl: string,
  requests: readonly RequestSpec[],
  options: LoadOptions,
): Promise<LoadResult> {
  await fire(baseUrl, requests, options.connections, options.warmupSeconds);
  return fire(baseUrl, requests, options.connections, options.seconds);
}
