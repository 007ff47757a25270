import { type EntityManager } from 'typeorm';

export interface Statement {
  sql: string;
  parameters: unknown[];
}

const quote = (identifier: string) => {
  if (identifier.includes('`')) throw new Error(`Unsafe identifier ${identifier}`);
  return `\`${identifier}\``;
};

/** `INSERT INTO t (a, b) VALUES (?, ?), (?, ?)`: one statement for many rows. */
export function multiRowInsert(
  table: string,
  columns: readonly string[],
  rows: ReadonlyArray<readonly unknown[]>,
): Statement {
  const placeholders = `(${columns.map(() => '?').join(', ')})`;
  return {
    sql: `INSERT INTO ${quote(table)} (${columns.map(quote).join(', ')}) VALUES ${rows
      .map(() => placeholders)
      .join(', ')}`,
    parameters: rows.flat(),
  };
}

/**
 * Collects rows per entity and writes them with multi-row INSERTs of `statementRows`
 * rows. Once any entity has `bufferRows` waiting, everything waiting is written, table by
 * table in the given order, so a child row never reaches the database before its parent
 * (and each table's indexes are filled in long runs, which is much faster than
 * alternating tables every statement). Rows are keyed by the entity's property names;
 * TypeORM's metadata names the columns, so a property the entity lacks fails here rather
 * than writing a wrong column.
 */
export class BatchWriter {
  private readonly pending = new Map<string, object[]>();
  readonly written: Record<string, number> = {};

  constructor(
    private readonly manager: EntityManager,
    /** Entity names, parents first. */
    private readonly order: readonly string[],
    private readonly sizes = { statementRows: 1000, bufferRows: 20_000 },
  ) {
    for (const entity of order) {
      this.pending.set(entity, []);
      this.written[entity] = 0;
    }
  }

  async add(entity: string, rows: readonly object[]): Promise<void> {
    const pending = this.pending.get(entity);
    if (!pending) throw new Error(`BatchWriter was not told where ${entity} goes in the order`);
    pending.push(...rows);
    if (pending.length >= this.sizes.bufferRows) await this.flush();
  }

  /** Writes everything waiting, parents first. */
  async flush(): Promise<void> {
    for (const entity of this.order) {
      const rows = this.pending.get(entity)!.splice(0);
      for (let start = 0; start < rows.length; start += this.sizes.statementRows) {
        const { sql, parameters } = this.statement(
          entity,
          rows.slice(start, start + this.sizes.statementRows),
        );
        await this.manager.query(sql, parameters);
      }
      this.written[entity]! += rows.length;
    }
  }

  private statement(entity: string, rows: readonly object[]): Statement {
    const metadata = this.manager.connection.getMetadata(entity);
    const properties = Object.keys(rows[0]!);
    const columns = properties.map((property) => {
      const column = metadata.findColumnWithPropertyName(property);
      if (!column) throw new Error(`${entity} has no property ${property}`);
      return column.databaseName;
    });
    return multiRowInsert(
      metadata.tableName,
      columns,
      rows.map((row) => properties.map((property) => (row as Record<string, unknown>)[property])),
    );
  }
}
