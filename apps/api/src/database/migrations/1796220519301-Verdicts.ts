import { MigrationInterface, QueryRunner } from 'typeorm';

export class Verdicts1796220519301 implements MigrationInterface {
  name = 'Verdicts1796220519301';

  public async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`
            CREATE TABLE \`rating_levels\` (
                \`id\` varchar(40) NOT NULL,
                \`number\` tinyint UNSIGNED NULL,
                \`label\` varchar(60) NOT NULL,
                \`description\` text NOT NULL,
                \`is_rating\` tinyint NOT NULL,
                \`updated_at\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3) ON UPDATE CURRENT_TIMESTAMP(3),
                \`version\` int NOT NULL,
                PRIMARY KEY (\`id\`)
            ) ENGINE = InnoDB
        `);
    // The default scale from PRODUCT.md, in the desk's own words; a desk chief edits it.
    // Numbers rise with how well a claim holds up, as schema.org's Rating expects
    // (bestRating is the highest value).
    await queryRunner.query(
      `INSERT INTO \`rating_levels\` (\`id\`, \`number\`, \`label\`, \`description\`, \`is_rating\`, \`version\`) VALUES
                (?, 5, ?, ?, 1, 1), (?, 4, ?, ?, 1, 1), (?, 3, ?, ?, 1, 1), (?, 2, ?, ?, 1, 1), (?, 1, ?, ?, 1, 1), (?, NULL, ?, ?, 0, 1)`,
      [
        'holds-up',
        'Holds up',
        'The claim matches the best available evidence, and nothing important is left out.',
        'holds-with-caveats',
        'Holds up with caveats',
        'The claim is broadly right, but needs context or qualification that changes how it reads.',
        'stretched',
        'Stretched',
        'The claim starts from something real but goes further than the evidence allows.',
        'unfounded',
        'Unfounded',
        'There is no sound evidence for the claim, though nothing decisively contradicts it.',
        'contradicted',
        'Contradicted by evidence',
        'Reliable evidence shows the claim is wrong.',
        'not-checkable',
        'Not checkable',
        'Not a rating: the statement is an opinion, a forecast, or has no testable content.',
      ],
    );
    await queryRunner.query(`
            CREATE TABLE \`verdict_versions\` (
                \`id\` uuid NOT NULL,
                \`created_by_id\` uuid NOT NULL,
                \`created_at\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
                \`updated_at\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3) ON UPDATE CURRENT_TIMESTAMP(3),
                \`version\` int NOT NULL,
                \`claim_id\` uuid NOT NULL,
                \`number\` int UNSIGNED NOT NULL,
                \`state\` enum (
                    'draft',
                    'submitted',
                    'sent_back',
                    'cleared',
                    'published',
                    'superseded'
                ) NOT NULL DEFAULT 'draft',
                \`rating_id\` varchar(40) NULL,
                \`bottom_line\` text NOT NULL,
                \`body\` json NOT NULL,
                \`body_html\` mediumtext NOT NULL,
                \`primary_source_id\` uuid NULL,
                \`last_edited_by_id\` uuid NOT NULL,
                \`submitted_at\` datetime(3) NULL,
                UNIQUE INDEX \`UQ_verdict_versions_claim_number\` (\`claim_id\`, \`number\`),
                PRIMARY KEY (\`id\`)
            ) ENGINE = InnoDB
        `);
    await queryRunner.query(`
            CREATE TABLE \`signoff_decisions\` (
                \`id\` uuid NOT NULL,
                \`claim_id\` uuid NOT NULL,
                \`version_id\` uuid NOT NULL,
                \`decision\` enum ('cleared', 'sent_back') NOT NULL,
                \`notes\` text NULL,
                \`decided_by_id\` uuid NOT NULL,
                \`checklist\` json NOT NULL,
                \`at\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
                INDEX \`IDX_signoff_decisions_version\` (\`version_id\`, \`at\`),
                PRIMARY KEY (\`id\`)
            ) ENGINE = InnoDB
        `);
    await queryRunner.query(`
            CREATE TABLE \`verdict_conflicts\` (
                \`id\` uuid NOT NULL,
                \`claim_id\` uuid NOT NULL,
                \`version_id\` uuid NOT NULL,
                \`saved_by_id\` uuid NOT NULL,
                \`rating_id\` varchar(40) NULL,
                \`bottom_line\` text NULL,
                \`body\` json NULL,
                \`at\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
                INDEX \`IDX_verdict_conflicts_claim\` (\`claim_id\`, \`at\`),
                PRIMARY KEY (\`id\`)
            ) ENGINE = InnoDB
        `);
    await queryRunner.query(`
            ALTER TABLE \`users\`
            ADD \`notifications_off\` json NULL
        `);
    await queryRunner.query(`
            ALTER TABLE \`claims\`
            ADD \`reply_waiver_reason\` text NULL
        `);
    await queryRunner.query(`
            ALTER TABLE \`claims\`
            ADD \`reply_waived_by_id\` uuid NULL
        `);
    await queryRunner.query(`
            ALTER TABLE \`claims\`
            ADD \`reply_waived_at\` datetime(3) NULL
        `);
    await queryRunner.query(`
            ALTER TABLE \`claims\`
            ADD CONSTRAINT \`FK_d8eabbf5d6b0e99799cfa77ae9b\` FOREIGN KEY (\`reply_waived_by_id\`) REFERENCES \`users\`(\`id\`) ON DELETE NO ACTION ON UPDATE NO ACTION
        `);
    await queryRunner.query(`
            ALTER TABLE \`verdict_versions\`
            ADD CONSTRAINT \`FK_7ea020cd8d61b90cb033a0512bb\` FOREIGN KEY (\`created_by_id\`) REFERENCES \`users\`(\`id\`) ON DELETE NO ACTION ON UPDATE NO ACTION
        `);
    await queryRunner.query(`
            ALTER TABLE \`verdict_versions\`
            ADD CONSTRAINT \`FK_89371099a4396bb10d32a87fcfe\` FOREIGN KEY (\`claim_id\`) REFERENCES \`claims\`(\`id\`) ON DELETE NO ACTION ON UPDATE NO ACTION
        `);
    await queryRunner.query(`
            ALTER TABLE \`verdict_versions\`
            ADD CONSTRAINT \`FK_80b226acc067794139e77f5a73e\` FOREIGN KEY (\`rating_id\`) REFERENCES \`rating_levels\`(\`id\`) ON DELETE NO ACTION ON UPDATE NO ACTION
        `);
    await queryRunner.query(`
            ALTER TABLE \`verdict_versions\`
            ADD CONSTRAINT \`FK_1aea39781b8361ec722063dea6e\` FOREIGN KEY (\`last_edited_by_id\`) REFERENCES \`users\`(\`id\`) ON DELETE NO ACTION ON UPDATE NO ACTION
        `);
    await queryRunner.query(`
            ALTER TABLE \`signoff_decisions\`
            ADD CONSTRAINT \`FK_7c8500a9f120cb84d535ecf34b2\` FOREIGN KEY (\`version_id\`) REFERENCES \`verdict_versions\`(\`id\`) ON DELETE NO ACTION ON UPDATE NO ACTION
        `);
    await queryRunner.query(`
            ALTER TABLE \`signoff_decisions\`
            ADD CONSTRAINT \`FK_122049b97ca89a78dd1ae7ead1c\` FOREIGN KEY (\`decided_by_id\`) REFERENCES \`users\`(\`id\`) ON DELETE NO ACTION ON UPDATE NO ACTION
        `);
    await queryRunner.query(`
            ALTER TABLE \`verdict_conflicts\`
            ADD CONSTRAINT \`FK_4b6d21b52767f1d90f6eb4859fa\` FOREIGN KEY (\`saved_by_id\`) REFERENCES \`users\`(\`id\`) ON DELETE NO ACTION ON UPDATE NO ACTION
        `);
  }

  public async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`
            ALTER TABLE \`verdict_conflicts\` DROP FOREIGN KEY \`FK_4b6d21b52767f1d90f6eb4859fa\`
        `);
    await queryRunner.query(`
            ALTER TABLE \`signoff_decisions\` DROP FOREIGN KEY \`FK_122049b97ca89a78dd1ae7ead1c\`
        `);
    await queryRunner.query(`
            ALTER TABLE \`signoff_decisions\` DROP FOREIGN KEY \`FK_7c8500a9f120cb84d535ecf34b2\`
        `);
    await queryRunner.query(`
            ALTER TABLE \`verdict_versions\` DROP FOREIGN KEY \`FK_1aea39781b8361ec722063dea6e\`
        `);
    await queryRunner.query(`
            ALTER TABLE \`verdict_versions\` DROP FOREIGN KEY \`FK_80b226acc067794139e77f5a73e\`
        `);
    await queryRunner.query(`
            ALTER TABLE \`verdict_versions\` DROP FOREIGN KEY \`FK_89371099a4396bb10d32a87fcfe\`
        `);
    await queryRunner.query(`
            ALTER TABLE \`verdict_versions\` DROP FOREIGN KEY \`FK_7ea020cd8d61b90cb033a0512bb\`
        `);
    await queryRunner.query(`
            ALTER TABLE \`claims\` DROP FOREIGN KEY \`FK_d8eabbf5d6b0e99799cfa77ae9b\`
        `);
    await queryRunner.query(`
            ALTER TABLE \`claims\` DROP COLUMN \`reply_waived_at\`
        `);
    await queryRunner.query(`
            ALTER TABLE \`claims\` DROP COLUMN \`reply_waived_by_id\`
        `);
    await queryRunner.query(`
            ALTER TABLE \`claims\` DROP COLUMN \`reply_waiver_reason\`
        `);
    await queryRunner.query(`
            ALTER TABLE \`users\` DROP COLUMN \`notifications_off\`
        `);
    await queryRunner.query(`
            DROP INDEX \`IDX_verdict_conflicts_claim\` ON \`verdict_conflicts\`
        `);
    await queryRunner.query(`
            DROP TABLE \`verdict_conflicts\`
        `);
    await queryRunner.query(`
            DROP INDEX \`IDX_signoff_decisions_version\` ON \`signoff_decisions\`
        `);
    await queryRunner.query(`
            DROP TABLE \`signoff_decisions\`
        `);
    await queryRunner.query(`
            DROP INDEX \`UQ_verdict_versions_claim_number\` ON \`verdict_versions\`
        `);
    await queryRunner.query(`
            DROP TABLE \`verdict_versions\`
        `);
    await queryRunner.query(`
            DROP TABLE \`rating_levels\`
        `);
  }
}
