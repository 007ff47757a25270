import { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * The queue sorted by last change or by summary, with no filter, read every claim and
 * sorted them (EXPLAIN: a full scan and a filesort). Each sort now has an index that
 * ends in the queue's tie-break (filed, then id), so a page is read straight off it.
 */
export class QueueSortIndexes1796219054468 implements MigrationInterface {
  name = 'QueueSortIndexes1796219054468';

  public async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`
            DROP INDEX \`IDX_claims_updated_at\` ON \`claims\`
        `);
    await queryRunner.query(`
            CREATE INDEX \`IDX_claims_updated_at\` ON \`claims\` (\`updated_at\`, \`created_at\`)
        `);
    await queryRunner.query(`
            CREATE INDEX \`IDX_claims_summary\` ON \`claims\` (\`summary\`, \`created_at\`)
        `);
  }

  public async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`
            DROP INDEX \`IDX_claims_summary\` ON \`claims\`
        `);
    await queryRunner.query(`
            DROP INDEX \`IDX_claims_updated_at\` ON \`claims\`
        `);
    await queryRunner.query(`
            CREATE INDEX \`IDX_claims_updated_at\` ON \`claims\` (\`updated_at\`)
        `);
  }
}
