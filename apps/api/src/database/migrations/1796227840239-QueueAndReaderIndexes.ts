import { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * Indexes the benchmark found missing at 100 000 claims (npm run bench):
 * - the queue filtered by status and sorted by last change or by summary read the
 *   whole sort index until enough claims of that status turned up (a status a few in a
 *   hundred claims have meant thousands of rows for one page); these read the status's
 *   claims in order;
 * - the reader index and the Atom feed list published explainers newest first by
 *   `first_published_at`, which had none: every page read all the claims to find the
 *   published ones and sort them.
 */
export class QueueAndReaderIndexes1796227840239 implements MigrationInterface {
  name = 'QueueAndReaderIndexes1796227840239';

  public async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`
            CREATE INDEX \`IDX_claims_status_updated_at\` ON \`claims\` (\`status\`, \`updated_at\`, \`created_at\`)
        `);
    await queryRunner.query(`
            CREATE INDEX \`IDX_claims_status_summary\` ON \`claims\` (\`status\`, \`summary\`, \`created_at\`)
        `);
    await queryRunner.query(`
            CREATE INDEX \`IDX_claims_first_published\` ON \`claims\` (\`first_published_at\`)
        `);
  }

  public async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`
            DROP INDEX \`IDX_claims_first_published\` ON \`claims\`
        `);
    await queryRunner.query(`
            DROP INDEX \`IDX_claims_status_summary\` ON \`claims\`
        `);
    await queryRunner.query(`
            DROP INDEX \`IDX_claims_status_updated_at\` ON \`claims\`
        `);
  }
}
