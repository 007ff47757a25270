import { MigrationInterface, QueryRunner } from 'typeorm';

export class WorkingsAndDatasets1796219107240 implements MigrationInterface {
  name = 'WorkingsAndDatasets1796219107240';

  public async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`
            CREATE TABLE \`datasets\` (
                \`id\` uuid NOT NULL,
                \`name\` varchar(160) NOT NULL,
                \`description\` text NOT NULL,
                \`attachment_id\` uuid NOT NULL,
                \`time_column\` varchar(120) NOT NULL,
                \`columns\` json NOT NULL,
                \`rows\` json NOT NULL,
                \`row_count\` int UNSIGNED NOT NULL,
                \`created_by_id\` uuid NOT NULL,
                \`created_at\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
                \`updated_at\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3) ON UPDATE CURRENT_TIMESTAMP(3),
                \`version\` int NOT NULL,
                INDEX \`IDX_datasets_name\` (\`name\`),
                PRIMARY KEY (\`id\`)
            ) ENGINE = InnoDB
        `);
    await queryRunner.query(`
            CREATE TABLE \`workings\` (
                \`id\` uuid NOT NULL,
                \`claim_id\` uuid NOT NULL,
                \`created_by_id\` uuid NOT NULL,
                \`created_at\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
                \`updated_at\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3) ON UPDATE CURRENT_TIMESTAMP(3),
                \`version\` int NOT NULL,
                \`calculator_id\` varchar(64) NOT NULL,
                \`library_version\` varchar(32) NOT NULL,
                \`inputs\` json NOT NULL,
                \`dataset_refs\` json NULL,
                \`outputs\` json NOT NULL,
                \`steps\` json NOT NULL,
                \`cautions\` json NOT NULL,
                \`monte_carlo\` json NULL,
                \`note\` text NULL,
                \`checked_at\` datetime(3) NULL,
                INDEX \`IDX_workings_claim\` (\`claim_id\`, \`created_at\`),
                PRIMARY KEY (\`id\`)
            ) ENGINE = InnoDB
        `);
    await queryRunner.query(`
            ALTER TABLE \`attachments\` DROP FOREIGN KEY \`FK_cbe981fc721374dc41693a06992\`
        `);
    await queryRunner.query(`
            DROP INDEX \`IDX_attachments_claim\` ON \`attachments\`
        `);
    await queryRunner.query(`
            ALTER TABLE \`attachments\` CHANGE \`claim_id\` \`claim_id\` uuid NULL
        `);
    await queryRunner.query(`
            CREATE INDEX \`IDX_attachments_claim\` ON \`attachments\` (\`claim_id\`, \`uploaded_at\`)
        `);
    await queryRunner.query(`
            ALTER TABLE \`attachments\`
            ADD CONSTRAINT \`FK_cbe981fc721374dc41693a06992\` FOREIGN KEY (\`claim_id\`) REFERENCES \`claims\`(\`id\`) ON DELETE NO ACTION ON UPDATE NO ACTION
        `);
    await queryRunner.query(`
            ALTER TABLE \`datasets\`
            ADD CONSTRAINT \`FK_1dd74a7510ae1da362b05c08493\` FOREIGN KEY (\`attachment_id\`) REFERENCES \`attachments\`(\`id\`) ON DELETE NO ACTION ON UPDATE NO ACTION
        `);
    await queryRunner.query(`
            ALTER TABLE \`datasets\`
            ADD CONSTRAINT \`FK_8ebcc256b2a349b20ef3bd7b493\` FOREIGN KEY (\`created_by_id\`) REFERENCES \`users\`(\`id\`) ON DELETE NO ACTION ON UPDATE NO ACTION
        `);
    await queryRunner.query(`
            ALTER TABLE \`workings\`
            ADD CONSTRAINT \`FK_0d3fbcfba0c90cdaab8e8bc64f4\` FOREIGN KEY (\`claim_id\`) REFERENCES \`claims\`(\`id\`) ON DELETE NO ACTION ON UPDATE NO ACTION
        `);
    await queryRunner.query(`
            ALTER TABLE \`workings\`
            ADD CONSTRAINT \`FK_169a36ae4decbe3c6ec90fbe407\` FOREIGN KEY (\`created_by_id\`) REFERENCES \`users\`(\`id\`) ON DELETE NO ACTION ON UPDATE NO ACTION
        `);
  }

  public async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`
            ALTER TABLE \`workings\` DROP FOREIGN KEY \`FK_169a36ae4decbe3c6ec90fbe407\`
        `);
    await queryRunner.query(`
            ALTER TABLE \`workings\` DROP FOREIGN KEY \`FK_0d3fbcfba0c90cdaab8e8bc64f4\`
        `);
    await queryRunner.query(`
            ALTER TABLE \`datasets\` DROP FOREIGN KEY \`FK_8ebcc256b2a349b20ef3bd7b493\`
        `);
    await queryRunner.query(`
            ALTER TABLE \`datasets\` DROP FOREIGN KEY \`FK_1dd74a7510ae1da362b05c08493\`
        `);
    await queryRunner.query(`
            ALTER TABLE \`attachments\` DROP FOREIGN KEY \`FK_cbe981fc721374dc41693a06992\`
        `);
    await queryRunner.query(`
            DROP INDEX \`IDX_attachments_claim\` ON \`attachments\`
        `);
    // Dataset files are the only attachments without a claim; they go with the datasets.
    await queryRunner.query(`
            DELETE FROM \`attachments\` WHERE \`claim_id\` IS NULL
        `);
    await queryRunner.query(`
            ALTER TABLE \`attachments\` CHANGE \`claim_id\` \`claim_id\` uuid NOT NULL
        `);
    await queryRunner.query(`
            CREATE INDEX \`IDX_attachments_claim\` ON \`attachments\` (\`claim_id\`, \`uploaded_at\`)
        `);
    await queryRunner.query(`
            ALTER TABLE \`attachments\`
            ADD CONSTRAINT \`FK_cbe981fc721374dc41693a06992\` FOREIGN KEY (\`claim_id\`) REFERENCES \`claims\`(\`id\`) ON DELETE NO ACTION ON UPDATE NO ACTION
        `);
    await queryRunner.query(`
            DROP INDEX \`IDX_workings_claim\` ON \`workings\`
        `);
    await queryRunner.query(`
            DROP TABLE \`workings\`
        `);
    await queryRunner.query(`
            DROP INDEX \`IDX_datasets_name\` ON \`datasets\`
        `);
    await queryRunner.query(`
            DROP TABLE \`datasets\`
        `);
  }
}
