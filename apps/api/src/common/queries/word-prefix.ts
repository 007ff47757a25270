import { Brackets, type ObjectLiteral, type SelectQueryBuilder } from 'typeorm';

/** `%` and `_` in what someone typed are letters, not wildcards. */
export const escapeLike = (value: string) => value.replace(/[\\%_]/g, (char) => `\\${char}`);

/**
 * Rows whose `column` starts with `typed`, or has a word starting with it (`mar` finds
 * "Councillor Edwyn Marsh"); `orExact` adds columns that must equal it (a DOI).
 */
export function whereWordStarts<T extends ObjectLiteral>(
  query: SelectQueryBuilder<T>,
  column: string,
  typed: string,
  orExact: string[] = [],
): SelectQueryBuilder<T> {
  const start = escapeLike(typed);
  return query.where(
    new Brackets((where) => {
      where
        .where(`${column} LIKE :start`, { start: `${start}%` })
        .orWhere(`${column} LIKE :word`, { word: `% ${start}%` });
      for (const exact of orExact) where.orWhere(`${exact} = :typed`, { typed });
    }),
  );
}
