import { type EntityManager } from 'typeorm';
import { describe, expect, it } from 'vitest';
import { BatchWriter, multiRowInsert } from './batch-writer';

describe('multiRowInsert', () => {
  it('writes many rows in one statement with their values as parameters', () => {
    expect(
      multiRowInsert(
        'claim_topics',
        ['claim_id', 'topic'],
        [
          ['c1', 'solar'],
          ['c2', 'sea-level'],
        ],
      ),
    ).toEqual({
      sql: 'INSERT INTO `claim_topics` (`claim_id`, `topic`) VALUES (?, ?), (?, ?)',
      parameters: ['c1', 'solar', 'c2', 'sea-level'],
    });
  });

  it('refuses an identifier that could break out of its quotes', () => {
    expect(() => multiRowInsert('claims`; DROP TABLE users; --', ['id'], [['x']])).toThrow(
      /Unsafe identifier/,
    );
  });
});

/**
 * An EntityManager with just what BatchWriter uses: TypeORM's metadata lookup for two
 * tables, and a query() that records each statement instead of sending it.
 */
function recordingManager() {
  const columns: Record<string, Record<string, string>> = {
    Parent: { id: 'id', name: 'display_name' },
    Child: { parentId: 'parent_id', label: 'label' },
  };
  const statements: string[] = [];
  const manager = {
    connection: {
      getMetadata: (entity: string) => ({
        tableName: entity.toLowerCase(),
        findColumnWithPropertyName: (property: string) => {
          const databaseName = columns[entity]?.[property];
          return databaseName ? { databaseName } : undefined;
        },
      }),
    },
    query: async (sql: string, parameters: unknown[]) => {
      statements.push(`${sql} | ${parameters.length}`);
    },
  };
  return { manager: manager as unknown as EntityManager, statements };
}

describe('BatchWriter', () => {
  it('writes parents before children, in statements of the given size', async () => {
    const { manager, statements } = recordingManager();
    const writer = new BatchWriter(manager, ['Parent', 'Child'], {
      statementRows: 2,
      bufferRows: 4,
    });
    for (let n = 1; n <= 3; n += 1) {
      await writer.add('Parent', [{ id: `p${n}`, name: `Parent ${n}` }]);
      await writer.add('Child', [
        { parentId: `p${n}`, label: 'a' },
        { parentId: `p${n}`, label: 'b' },
      ]);
    }
    await writer.flush();
    expect(statements).toEqual([
      // Four children waiting after the second parent: everything waiting is written.
      'INSERT INTO `parent` (`id`, `display_name`) VALUES (?, ?), (?, ?) | 4',
      'INSERT INTO `child` (`parent_id`, `label`) VALUES (?, ?), (?, ?) | 4',
      'INSERT INTO `child` (`parent_id`, `label`) VALUES (?, ?), (?, ?) | 4',
      'INSERT INTO `parent` (`id`, `display_name`) VALUES (?, ?) | 2',
      'INSERT INTO `child` (`parent_id`, `label`) VALUES (?, ?), (?, ?) | 4',
    ]);
    expect(writer.written).toEqual({ Parent: 3, Child: 6 });
  });

  it('fails on a property the entity does not have, or an entity outside its order', async () => {
    const { manager } = recordingManager();
    const writer = new BatchWriter(manager, ['Parent']);
    await writer.add('Parent', [{ id: 'p1', nickname: 'x' }]);
    await expect(writer.flush()).rejects.toThrow('Parent has no property nickname');
    await expect(writer.add('Child', [])).rejects.toThrow(/Child/);
  });
});
