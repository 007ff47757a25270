import { type Pool, type RowDataPacket } from 'mysql2/promise';
import { type Runner } from './load.js';
import { type TypoCase } from './search-cases.js';

/**
 * The search the desk would have without a search engine, over the same rows (the
 * claims' summaries and texts), answering the same page: `LIKE '%word%'`, or an InnoDB
 * FULLTEXT index (made in the benchmark's database only). `SQL_NO_CACHE`: on a server
 * with MariaDB's query cache on, the repeated statements would otherwise be answered from
 * it, not searched.
 */
export interface Statement {
  sql: string;
  params: unknown[];
}

export type SqlEngine = 'like' | 'fulltext';

export const FULLTEXT_INDEX = 'FT_bench_claims_summary_text';

export const createFulltextIndex = `ALTER TABLE claims ADD FULLTEXT INDEX ${FULLTEXT_INDEX} (summary, text)`;

const wordsOf = (text: string) => [...new Set(text.toLowerCase().match(/\p{L}+/gu) ?? [])];
const MATCH = 'MATCH(summary, text) AGAINST (?';

/** The desk's search: every word must match; a page of 20, with the total. */
export function searchStatement(engine: SqlEngine, q: string): Statement {
  const words = wordsOf(q);
  if (engine === 'like') {
    return {
      sql: `SELECT SQL_NO_CACHE id, COUNT(*) OVER () AS total FROM claims
             WHERE ${words.map(() => '(summary LIKE ? OR text LIKE ?)').join(' AND ')}
             ORDER BY created_at DESC LIMIT 20`,
      params: words.flatMap((word) => [`%${word}%`, `%${word}%`]),
    };
  }
  const against = words.map((word) => `+${word}`).join(' ');
  return {
    sql: `SELECT SQL_NO_CACHE id, COUNT(*) OVER () AS total FROM claims
           WHERE ${MATCH} IN BOOLEAN MODE)
           ORDER BY ${MATCH} IN BOOLEAN MODE) DESC LIMIT 20`,
    params: [against, against],
  };
}

/**
 * Similar claims: any word may match; the closest five. LIKE ranks by how many of the
 * words a claim holds, the nearest it has to a relevance.
 */
export function similarStatement(engine: SqlEngine, text: string): Statement {
  const words = wordsOf(text).filter((word) => word.length >= 4);
  if (engine === 'like') {
    const holds = words.map(() => '(summary LIKE ? OR text LIKE ?)');
    return {
      sql: `SELECT SQL_NO_CACHE id FROM claims WHERE ${holds.join(' OR ')}
             ORDER BY ${holds.join(' + ')} DESC, created_at DESC LIMIT 5`,
      params: [0, 1].flatMap(() => words.flatMap((word) => [`%${word}%`, `%${word}%`])),
    };
  }
  return {
    sql: `SELECT SQL_NO_CACHE id FROM claims WHERE ${MATCH}) ORDER BY ${MATCH}) DESC LIMIT 5`,
    params: [text, text],
  };
}

/**
 * The statements run in turn on `connections` connections at once, each timed, as a side
 * of `loadInTurns`.
 */
export const statementsRunner =
  (pool: Pool, statements: readonly Statement[], connections: number): Runner =>
  async (seconds) => {
    const latencies: number[] = [];
    const deadline = performance.now() + seconds * 1000;
    await Promise.all(
      Array.from({ length: connections }, async (_, worker) => {
        for (let n = worker; performance.now() < deadline; n += 1) {
          const statement = statements[n % statements.length]!;
          const started = performance.now();
          await pool.query(statement.sql, statement.params);
          latencies.push(performance.now() - started);
        }
      }),
    );
    return { latencies, bytes: 0, failures: 0, failedStatuses: new Set<number>(), seconds };
  };

/** Whether any of these claims holds the word (in its summary or its text). */
export async function holdsWord(pool: Pool, ids: string[], word: string): Promise<boolean> {
  if (ids.length === 0) return false;
  const [rows] = await pool.query<RowDataPacket[]>(
    'SELECT 1 FROM claims WHERE id IN (?) AND (summary LIKE ? OR text LIKE ?) LIMIT 1',
    [ids, `%${word}%`, `%${word}%`],
  );
  return rows.length > 0;
}

/**
 * Typo recall: the share of misspelled queries whose first `depth` answers hold a claim
 * with the word that was meant. `found` answers a query with its ids, best first.
 */
export async function typoRecall(
  pool: Pool,
  cases: readonly TypoCase[],
  depth: number,
  found: (query: string) => Promise<string[]>,
): Promise<number> {
  let recalled = 0;
  for (const { query, intended } of cases) {
    if (await holdsWord(pool, (await found(query)).slice(0, depth), intended)) recalled += 1;
  }
  return recalled / cases.length;
}

/** The ids a statement answers. */
export async function idsOf(pool: Pool, statement: Statement): Promise<string[]> {
  const [rows] = await pool.query<RowDataPacket[]>(statement.sql, statement.params);
  return rows.map((row) => String(row.id));
}
