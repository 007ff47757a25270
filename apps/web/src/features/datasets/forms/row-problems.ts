import { isApiError } from '@/lib/api-client';

/** One bad cell or line of a refused CSV, as the API names it in `fields`. */
export interface RowProblem {
  /** The line of the file, the header being line 1. */
  line: number;
  /** The CSV header of the column, when the problem is in one. */
  column: string | null;
  problem: string;
}

/** `line 14: anomaly` or `line 2`: how the API keys each problem of a refused import. */
const lineKey = /^line (\d+)(?:: (.+))?$/;

/** The problems of a refused import, by line; empty when the error is of another kind. */
export function rowProblemsOf(error: unknown): RowProblem[] {
  if (!isApiError(error) || error.status !== 422) return [];
  return Object.entries(error.body.fields ?? {}).flatMap(([key, problem]) => {
    const match = lineKey.exec(key);
    return match ? [{ line: Number(match[1]), column: match[2] ?? null, problem }] : [];
  });
}
