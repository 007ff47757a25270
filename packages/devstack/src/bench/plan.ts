/** How big a benchmark run is: the full one of the issue, or a quick look. */
export interface BenchPlan {
  mode: 'full' | 'quick';
  claims: number;
  explainers: number;
  /** Length of each measured run, after a warm-up run of `warmupSeconds`. */
  seconds: number;
  warmupSeconds: number;
  /** Slices a path and its reference take turns in (`loadSideBySide`). */
  rounds: number;
}

export const benchPlans: Record<BenchPlan['mode'], BenchPlan> = {
  full: {
    mode: 'full',
    claims: 100_000,
    explainers: 5_000,
    seconds: 10,
    warmupSeconds: 2,
    rounds: 5,
  },
  quick: { mode: 'quick', claims: 5_000, explainers: 500, seconds: 3, warmupSeconds: 1, rounds: 3 },
};

/**
 * Connections kept busy at once: the 32 for the queue (the desk's throughput), and
 * 4 for the paths judged by latency (a few people opening claims, searching, saving or
 * reading at the same moment). A reference runs with its row's connections.
 */
export const connections = { throughput: 32, latency: 4 } as const;
