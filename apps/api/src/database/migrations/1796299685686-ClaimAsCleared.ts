import { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * The claim as the copy desk cleared it (its words, summary, claimant, and which
 * appearances and sources it had), kept with each verdict version, so reader pages show
 * what was signed off, not edits made since for a correction. Versions already cleared
 * take the claim as it is now: the closest record there is.
 */
export class ClaimAsCleared1796299685686 implements MigrationInterface {
  name = 'ClaimAsCleared1796299685686';

  public async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`
            ALTER TABLE \`verdict_versions\`
            ADD \`claim_text\` text NULL
        `);
    await queryRunner.query(`
            ALTER TABLE \`verdict_versions\`
            ADD \`claim_summary\` varchar(75) NULL
        `);
    await queryRunner.query(`
            ALTER TABLE \`verdict_versions\`
            ADD \`claimant_id\` uuid NULL
        `);
    await queryRunner.query(`
            ALTER TABLE \`verdict_versions\`
            ADD CONSTRAINT \`FK_c96f834dd3b742cfbd12ba1cae4\` FOREIGN KEY (\`claimant_id\`) REFERENCES \`claimants\`(\`id\`) ON DELETE NO ACTION ON UPDATE NO ACTION
        `);
    await queryRunner.query(`
            ALTER TABLE \`verdict_versions\`
            ADD \`cleared_parts\` json NULL
        `);
    await queryRunner.query(`
            UPDATE \`verdict_versions\` \`v\`
            JOIN \`claims\` \`c\` ON \`c\`.\`id\` = \`v\`.\`claim_id\`
            SET \`v\`.\`claim_text\` = \`c\`.\`text\`,
                \`v\`.\`claim_summary\` = \`c\`.\`summary\`,
                \`v\`.\`claimant_id\` = \`c\`.\`claimant_id\`,
                \`v\`.\`cleared_parts\` = JSON_OBJECT(
                  'appearanceIds', COALESCE(
                    (SELECT JSON_ARRAYAGG(\`a\`.\`id\`) FROM \`appearances\` \`a\` WHERE \`a\`.\`claim_id\` = \`c\`.\`id\`),
                    JSON_ARRAY()),
                  'sourceIds', COALESCE(
                    (SELECT JSON_ARRAYAGG(\`s\`.\`source_id\`) FROM \`claim_sources\` \`s\` WHERE \`s\`.\`claim_id\` = \`c\`.\`id\`),
                    JSON_ARRAY()))
            WHERE \`v\`.\`state\` IN ('cleared', 'published', 'superseded')
        `);
  }

  public async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`
            ALTER TABLE \`verdict_versions\` DROP COLUMN \`cleared_parts\`
        `);
    await queryRunner.query(`
            ALTER TABLE \`verdict_versions\` DROP FOREIGN KEY \`FK_c96f834dd3b742cfbd12ba1cae4\`
        `);
    await queryRunner.query(`
            ALTER TABLE \`verdict_versions\` DROP COLUMN \`claimant_id\`
        `);
    await queryRunner.query(`
            ALTER TABLE \`verdict_versions\` DROP COLUMN \`claim_summary\`
        `);
    await queryRunner.query(`
            ALTER TABLE \`verdict_versions\` DROP COLUMN \`claim_text\`
        `);
  }
}
