import { type DataSource } from 'typeorm';

export interface LoggedQuery {
  sql: string;
  parameters: unknown[];
}

/** One step of MariaDB's plain EXPLAIN, with the table its alias stands for. */
export interface PlanStep {
  id: number | null;
  selectType: string;
  /** The base table, or the alias itself for derived tables and subqueries. */
  table: string;
  alias: string;
  type: string | null;
  key: string | null;
  rows: number;
  extra: string;
}

/**
 * Runs `work` and returns what it returned with every query it sent, exactly as TypeORM
 * sent them (its logger sees each query before it goes to the driver).
 */
export async function captureQueries<T>(
  dataSource: DataSource,
  work: () => Promise<T>,
): Promise<{ result: T; queries: LoggedQuery[] }> {
  const queries: LoggedQuery[] = [];
  const spy = jest.spyOn(dataSource.logger, 'logQuery').mockImplementation((sql, parameters) => {
    // MariaDB queries carry positional parameters; TypeORM types them loosely.
    queries.push({ sql, parameters: Array.isArray(parameters) ? parameters : [] });
  });
  try {
    return { result: await work(), queries };
  } finally {
    spy.mockRestore();
  }
}

/** `alias → table` for every `FROM`/`JOIN` of the statement, quoted or not. */
function aliasesOf(sql: string): Map<string, string> {
  const aliases = new Map<string, string>();
  for (const match of sql.matchAll(/\b(?:FROM|JOIN)\s+`?(\w+)`?\s+(?:AS\s+)?`?(\w+)`?/gi)) {
    aliases.set(match[2]!, match[1]!);
  }
  return aliases;
}

/** MariaDB's plan for a logged query, run with the same parameters. */
export async function explain(dataSource: DataSource, query: LoggedQuery): Promise<PlanStep[]> {
  const aliases = aliasesOf(query.sql);
  const rows = (await dataSource.query(`EXPLAIN ${query.sql}`, query.parameters)) as Array<
    Record<string, string | number | null>
  >;
  return rows.map((row) => {
    const alias = String(row.table);
    return {
      id: row.id === null ? null : Number(row.id),
      selectType: String(row.select_type),
      table: aliases.get(alias) ?? alias,
      alias,
      type: row.type === null ? null : String(row.type),
      key: row.key === null ? null : String(row.key),
      rows: Number(row.rows),
      extra: String(row.Extra ?? ''),
    };
  });
}

/** A plan in one line a step, for failure messages. */
export function describePlan(steps: readonly PlanStep[]): string {
  return steps
    .map(
      (step) =>
        `${step.selectType} ${step.alias}(${step.table}) ${step.type} key=${step.key} rows=${step.rows} ${step.extra}`,
    )
    .join('\n');
}
