import { MigrationInterface, QueryRunner } from 'typeorm';

export class Publishing1796221845244 implements MigrationInterface {
  name = 'Publishing1796221845244';

  public async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`
            CREATE TABLE \`publications\` (
                \`id\` uuid NOT NULL,
                \`claim_id\` uuid NOT NULL,
                \`version_id\` uuid NOT NULL,
                \`sequence\` int UNSIGNED NOT NULL,
                \`state\` enum ('scheduled', 'published', 'cancelled') NOT NULL,
                \`scheduled_for\` datetime(3) NULL,
                \`scheduled_time_zone\` varchar(64) NULL,
                \`published_at\` datetime(3) NULL,
                \`note_kind\` enum (
                    'correction',
                    'clarification',
                    'update',
                    'rating_change',
                    'retraction'
                ) NULL,
                \`note_text\` text NULL,
                \`created_by_id\` uuid NOT NULL,
                \`created_at\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
                INDEX \`IDX_publications_published\` (\`state\`, \`published_at\`),
                INDEX \`IDX_publications_due\` (\`state\`, \`scheduled_for\`),
                UNIQUE INDEX \`UQ_publications_claim_sequence\` (\`claim_id\`, \`sequence\`),
                PRIMARY KEY (\`id\`)
            ) ENGINE = InnoDB
        `);
    await queryRunner.query(`
            CREATE TABLE \`reader_subscriptions\` (
                \`id\` uuid NOT NULL,
                \`claim_id\` uuid NOT NULL,
                \`email\` varchar(254) NOT NULL,
                \`confirm_token_hash\` char(64) NOT NULL,
                \`confirmed_at\` datetime(3) NULL,
                \`created_at\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
                INDEX \`IDX_reader_subscriptions_confirm\` (\`confirm_token_hash\`),
                UNIQUE INDEX \`UQ_reader_subscriptions_claim_email\` (\`claim_id\`, \`email\`),
                PRIMARY KEY (\`id\`)
            ) ENGINE = InnoDB
        `);
    await queryRunner.query(`
            ALTER TABLE \`claims\`
            ADD \`slug\` varchar(100) NULL
        `);
    await queryRunner.query(`
            ALTER TABLE \`claims\`
            ADD \`first_published_at\` datetime(3) NULL
        `);
    await queryRunner.query(`
            CREATE UNIQUE INDEX \`UQ_claims_slug\` ON \`claims\` (\`slug\`)
        `);
    await queryRunner.query(`
            ALTER TABLE \`publications\`
            ADD CONSTRAINT \`FK_ca79e33aa62297aab7a405e9121\` FOREIGN KEY (\`claim_id\`) REFERENCES \`claims\`(\`id\`) ON DELETE NO ACTION ON UPDATE NO ACTION
        `);
    await queryRunner.query(`
            ALTER TABLE \`publications\`
            ADD CONSTRAINT \`FK_89d53a9e2b212ccef528a20ec7e\` FOREIGN KEY (\`version_id\`) REFERENCES \`verdict_versions\`(\`id\`) ON DELETE NO ACTION ON UPDATE NO ACTION
        `);
    await queryRunner.query(`
            ALTER TABLE \`publications\`
            ADD CONSTRAINT \`FK_7d8d1a613250f987d289ce40550\` FOREIGN KEY (\`created_by_id\`) REFERENCES \`users\`(\`id\`) ON DELETE NO ACTION ON UPDATE NO ACTION
        `);
    await queryRunner.query(`
            ALTER TABLE \`reader_subscriptions\`
            ADD CONSTRAINT \`FK_2e0067c5e40f8f45f86dd175097\` FOREIGN KEY (\`claim_id\`) REFERENCES \`claims\`(\`id\`) ON DELETE NO ACTION ON UPDATE NO ACTION
        `);
  }

  public async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`
            ALTER TABLE \`reader_subscriptions\` DROP FOREIGN KEY \`FK_2e0067c5e40f8f45f86dd175097\`
        `);
    await queryRunner.query(`
            ALTER TABLE \`publications\` DROP FOREIGN KEY \`FK_7d8d1a613250f987d289ce40550\`
        `);
    await queryRunner.query(`
            ALTER TABLE \`publications\` DROP FOREIGN KEY \`FK_89d53a9e2b212ccef528a20ec7e\`
        `);
    await queryRunner.query(`
            ALTER TABLE \`publications\` DROP FOREIGN KEY \`FK_ca79e33aa62297aab7a405e9121\`
        `);
    await queryRunner.query(`
            DROP INDEX \`UQ_claims_slug\` ON \`claims\`
        `);
    await queryRunner.query(`
            ALTER TABLE \`claims\` DROP COLUMN \`slug\`
        `);
    await queryRunner.query(`
            ALTER TABLE \`claims\` DROP COLUMN \`first_published_at\`
        `);
    await queryRunner.query(`
            DROP INDEX \`UQ_reader_subscriptions_claim_email\` ON \`reader_subscriptions\`
        `);
    await queryRunner.query(`
            DROP INDEX \`IDX_reader_subscriptions_confirm\` ON \`reader_subscriptions\`
        `);
    await queryRunner.query(`
            DROP TABLE \`reader_subscriptions\`
        `);
    await queryRunner.query(`
            DROP INDEX \`UQ_publications_claim_sequence\` ON \`publications\`
        `);
    await queryRunner.query(`
            DROP INDEX \`IDX_publications_due\` ON \`publications\`
        `);
    await queryRunner.query(`
            DROP INDEX \`IDX_publications_published\` ON \`publications\`
        `);
    await queryRunner.query(`
            DROP TABLE \`publications\`
        `);
  }
}
