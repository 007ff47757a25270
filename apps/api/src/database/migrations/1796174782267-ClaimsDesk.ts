import { MigrationInterface, QueryRunner } from 'typeorm';

export class ClaimsDesk1796174782267 implements MigrationInterface {
  name = 'ClaimsDesk1796174782267';

  public async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`
            CREATE TABLE \`claimants\` (
                \`id\` uuid NOT NULL,
                \`name\` varchar(160) NOT NULL,
                \`kind\` enum (
                    'public_figure',
                    'organisation',
                    'private_individual'
                ) NOT NULL,
                \`affiliation\` varchar(160) NULL,
                \`notes\` text NULL,
                \`name_shown_publicly\` tinyint NOT NULL DEFAULT 0,
                \`created_by_id\` uuid NULL,
                \`created_at\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
                \`updated_at\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3) ON UPDATE CURRENT_TIMESTAMP(3),
                \`version\` int NOT NULL,
                INDEX \`IDX_claimants_name\` (\`name\`),
                PRIMARY KEY (\`id\`)
            ) ENGINE = InnoDB
        `);
    await queryRunner.query(`
            CREATE TABLE \`claim_topics\` (
                \`claim_id\` uuid NOT NULL,
                \`topic\` varchar(40) NOT NULL,
                INDEX \`IDX_claim_topics_topic\` (\`topic\`, \`claim_id\`),
                PRIMARY KEY (\`claim_id\`, \`topic\`)
            ) ENGINE = InnoDB
        `);
    await queryRunner.query(`
            CREATE TABLE \`claims\` (
                \`id\` uuid NOT NULL,
                \`text\` text NOT NULL,
                \`summary\` varchar(75) NOT NULL,
                \`status\` enum (
                    'filed',
                    'in_research',
                    'awaiting_signoff',
                    'sent_back',
                    'cleared',
                    'published',
                    'set_aside'
                ) NOT NULL DEFAULT 'filed',
                \`legal_review\` tinyint NOT NULL DEFAULT 0,
                \`claimant_id\` uuid NOT NULL,
                \`assignee_id\` uuid NULL,
                \`filed_by_id\` uuid NOT NULL,
                \`set_aside_reason\` enum ('duplicate', 'not_checkable', 'out_of_scope') NULL,
                \`set_aside_note\` text NULL,
                \`created_at\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
                \`updated_at\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3) ON UPDATE CURRENT_TIMESTAMP(3),
                \`version\` int NOT NULL,
                INDEX \`IDX_claims_legal\` (\`legal_review\`, \`status\`, \`created_at\`),
                INDEX \`IDX_claims_claimant\` (\`claimant_id\`, \`created_at\`),
                INDEX \`IDX_claims_filed_by\` (\`filed_by_id\`, \`status\`, \`created_at\`),
                INDEX \`IDX_claims_assignee\` (\`assignee_id\`, \`status\`, \`created_at\`),
                INDEX \`IDX_claims_status\` (\`status\`, \`created_at\`),
                INDEX \`IDX_claims_updated_at\` (\`updated_at\`),
                INDEX \`IDX_claims_filed_at\` (\`created_at\`),
                PRIMARY KEY (\`id\`)
            ) ENGINE = InnoDB
        `);
    await queryRunner.query(`
            CREATE TABLE \`attachments\` (
                \`id\` uuid NOT NULL,
                \`claim_id\` uuid NOT NULL,
                \`original_name\` varchar(255) NOT NULL,
                \`media_type\` varchar(100) NOT NULL,
                \`size\` bigint UNSIGNED NOT NULL,
                \`sha256\` char(64) NOT NULL,
                \`storage_key\` varchar(200) NOT NULL,
                \`uploaded_by_id\` uuid NOT NULL,
                \`uploaded_at\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
                INDEX \`IDX_attachments_sha256\` (\`sha256\`),
                INDEX \`IDX_attachments_claim\` (\`claim_id\`, \`uploaded_at\`),
                PRIMARY KEY (\`id\`)
            ) ENGINE = InnoDB
        `);
    await queryRunner.query(`
            CREATE TABLE \`appearances\` (
                \`id\` uuid NOT NULL,
                \`claim_id\` uuid NOT NULL,
                \`created_by_id\` uuid NOT NULL,
                \`created_at\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
                \`updated_at\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3) ON UPDATE CURRENT_TIMESTAMP(3),
                \`version\` int NOT NULL,
                \`url\` varchar(2048) NOT NULL,
                \`outlet\` varchar(160) NOT NULL,
                \`seen_at\` datetime(3) NOT NULL,
                \`seen_time_zone\` varchar(64) NOT NULL,
                \`is_first_known\` tinyint NOT NULL DEFAULT 0,
                \`capture_attachment_id\` uuid NULL,
                INDEX \`IDX_appearances_claim\` (\`claim_id\`, \`seen_at\`),
                PRIMARY KEY (\`id\`)
            ) ENGINE = InnoDB
        `);
    await queryRunner.query(`
            CREATE TABLE \`comments\` (
                \`id\` uuid NOT NULL,
                \`claim_id\` uuid NOT NULL,
                \`created_by_id\` uuid NOT NULL,
                \`created_at\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
                \`updated_at\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3) ON UPDATE CURRENT_TIMESTAMP(3),
                \`version\` int NOT NULL,
                \`body\` text NOT NULL,
                \`edited_at\` datetime(3) NULL,
                INDEX \`IDX_comments_claim\` (\`claim_id\`, \`created_at\`),
                PRIMARY KEY (\`id\`)
            ) ENGINE = InnoDB
        `);
    await queryRunner.query(`
            CREATE TABLE \`expert_consultations\` (
                \`id\` uuid NOT NULL,
                \`claim_id\` uuid NOT NULL,
                \`created_by_id\` uuid NOT NULL,
                \`created_at\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
                \`updated_at\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3) ON UPDATE CURRENT_TIMESTAMP(3),
                \`version\` int NOT NULL,
                \`name\` varchar(160) NOT NULL,
                \`affiliation\` varchar(200) NOT NULL,
                \`field\` varchar(160) NOT NULL,
                \`quote\` text NOT NULL,
                \`consulted_on\` date NOT NULL,
                \`declared_conflicts\` text NOT NULL,
                \`independent_of_claimant\` tinyint NOT NULL,
                INDEX \`IDX_expert_consultations_claim\` (\`claim_id\`, \`consulted_on\`),
                PRIMARY KEY (\`id\`)
            ) ENGINE = InnoDB
        `);
    await queryRunner.query(`
            CREATE TABLE \`reply_attempts\` (
                \`id\` uuid NOT NULL,
                \`claim_id\` uuid NOT NULL,
                \`created_by_id\` uuid NOT NULL,
                \`created_at\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
                \`updated_at\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3) ON UPDATE CURRENT_TIMESTAMP(3),
                \`version\` int NOT NULL,
                \`contacted\` varchar(200) NOT NULL,
                \`contacted_at\` datetime(3) NOT NULL,
                \`channel\` enum (
                    'email',
                    'phone',
                    'letter',
                    'social_message',
                    'in_person',
                    'spokesperson',
                    'other'
                ) NOT NULL,
                \`deadline\` datetime(3) NULL,
                \`outcome\` enum ('awaiting', 'replied', 'declined', 'no_reply') NOT NULL DEFAULT 'awaiting',
                \`reply\` text NULL,
                INDEX \`IDX_reply_attempts_claim\` (\`claim_id\`, \`contacted_at\`),
                PRIMARY KEY (\`id\`)
            ) ENGINE = InnoDB
        `);
    await queryRunner.query(`
            CREATE TABLE \`sources\` (
                \`id\` uuid NOT NULL,
                \`title\` varchar(300) NOT NULL,
                \`authors\` varchar(500) NULL,
                \`publisher\` varchar(200) NULL,
                \`year\` smallint UNSIGNED NULL,
                \`doi\` varchar(200) NULL,
                \`url\` varchar(2048) NULL,
                \`accessed_on\` date NULL,
                \`kind\` enum (
                    'peer_reviewed_paper',
                    'preprint',
                    'assessment_report',
                    'agency_dataset',
                    'agency_statement',
                    'press_release',
                    'news_report',
                    'blog_or_social_post',
                    'expert_interview'
                ) NOT NULL,
                \`grade\` enum ('strong', 'adequate', 'weak', 'unreliable') NOT NULL,
                \`grade_reason\` text NOT NULL,
                \`created_by_id\` uuid NOT NULL,
                \`created_at\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
                \`updated_at\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3) ON UPDATE CURRENT_TIMESTAMP(3),
                \`version\` int NOT NULL,
                INDEX \`IDX_sources_title\` (\`title\`),
                INDEX \`IDX_sources_doi\` (\`doi\`),
                PRIMARY KEY (\`id\`)
            ) ENGINE = InnoDB
        `);
    await queryRunner.query(`
            CREATE TABLE \`claim_sources\` (
                \`claim_id\` uuid NOT NULL,
                \`source_id\` uuid NOT NULL,
                \`linked_by_id\` uuid NOT NULL,
                \`linked_at\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
                INDEX \`IDX_claim_sources_source\` (\`source_id\`),
                PRIMARY KEY (\`claim_id\`, \`source_id\`)
            ) ENGINE = InnoDB
        `);
    await queryRunner.query(`
            ALTER TABLE \`audit_events\`
            ADD \`claim_id\` uuid NULL
        `);
    await queryRunner.query(`
            CREATE INDEX \`IDX_audit_events_claim\` ON \`audit_events\` (\`claim_id\`, \`at\`)
        `);
    await queryRunner.query(`
            ALTER TABLE \`claim_topics\`
            ADD CONSTRAINT \`FK_9faca90b36767e37e354b6c6421\` FOREIGN KEY (\`claim_id\`) REFERENCES \`claims\`(\`id\`) ON DELETE CASCADE ON UPDATE NO ACTION
        `);
    await queryRunner.query(`
            ALTER TABLE \`claims\`
            ADD CONSTRAINT \`FK_d036d8b74e0510ea3779a504f90\` FOREIGN KEY (\`claimant_id\`) REFERENCES \`claimants\`(\`id\`) ON DELETE NO ACTION ON UPDATE NO ACTION
        `);
    await queryRunner.query(`
            ALTER TABLE \`claims\`
            ADD CONSTRAINT \`FK_8490bdc93ac2749f5541aa792e4\` FOREIGN KEY (\`assignee_id\`) REFERENCES \`users\`(\`id\`) ON DELETE NO ACTION ON UPDATE NO ACTION
        `);
    await queryRunner.query(`
            ALTER TABLE \`claims\`
            ADD CONSTRAINT \`FK_d96370e6a5cf3ff628039d3624d\` FOREIGN KEY (\`filed_by_id\`) REFERENCES \`users\`(\`id\`) ON DELETE NO ACTION ON UPDATE NO ACTION
        `);
    await queryRunner.query(`
            ALTER TABLE \`attachments\`
            ADD CONSTRAINT \`FK_cbe981fc721374dc41693a06992\` FOREIGN KEY (\`claim_id\`) REFERENCES \`claims\`(\`id\`) ON DELETE NO ACTION ON UPDATE NO ACTION
        `);
    await queryRunner.query(`
            ALTER TABLE \`attachments\`
            ADD CONSTRAINT \`FK_70a38fc450d3b433c86b67e69d6\` FOREIGN KEY (\`uploaded_by_id\`) REFERENCES \`users\`(\`id\`) ON DELETE NO ACTION ON UPDATE NO ACTION
        `);
    await queryRunner.query(`
            ALTER TABLE \`appearances\`
            ADD CONSTRAINT \`FK_65236efa99eae89b998ed6c96b6\` FOREIGN KEY (\`claim_id\`) REFERENCES \`claims\`(\`id\`) ON DELETE NO ACTION ON UPDATE NO ACTION
        `);
    await queryRunner.query(`
            ALTER TABLE \`appearances\`
            ADD CONSTRAINT \`FK_70aa78979c4ee71577a2220d6f0\` FOREIGN KEY (\`created_by_id\`) REFERENCES \`users\`(\`id\`) ON DELETE NO ACTION ON UPDATE NO ACTION
        `);
    await queryRunner.query(`
            ALTER TABLE \`appearances\`
            ADD CONSTRAINT \`FK_0b14f5551c623cc6de582e1d093\` FOREIGN KEY (\`capture_attachment_id\`) REFERENCES \`attachments\`(\`id\`) ON DELETE NO ACTION ON UPDATE NO ACTION
        `);
    await queryRunner.query(`
            ALTER TABLE \`comments\`
            ADD CONSTRAINT \`FK_25549ce5482606fd2b00c93d2f1\` FOREIGN KEY (\`claim_id\`) REFERENCES \`claims\`(\`id\`) ON DELETE NO ACTION ON UPDATE NO ACTION
        `);
    await queryRunner.query(`
            ALTER TABLE \`comments\`
            ADD CONSTRAINT \`FK_cd90453c0d69f858427204e45a3\` FOREIGN KEY (\`created_by_id\`) REFERENCES \`users\`(\`id\`) ON DELETE NO ACTION ON UPDATE NO ACTION
        `);
    await queryRunner.query(`
            ALTER TABLE \`expert_consultations\`
            ADD CONSTRAINT \`FK_2f4b4fcab20b22d6829589c6ca2\` FOREIGN KEY (\`claim_id\`) REFERENCES \`claims\`(\`id\`) ON DELETE NO ACTION ON UPDATE NO ACTION
        `);
    await queryRunner.query(`
            ALTER TABLE \`expert_consultations\`
            ADD CONSTRAINT \`FK_539fa2d0b91336b21c75e78819b\` FOREIGN KEY (\`created_by_id\`) REFERENCES \`users\`(\`id\`) ON DELETE NO ACTION ON UPDATE NO ACTION
        `);
    await queryRunner.query(`
            ALTER TABLE \`reply_attempts\`
            ADD CONSTRAINT \`FK_cf07a74db6d612ee2b5cb5b59d1\` FOREIGN KEY (\`claim_id\`) REFERENCES \`claims\`(\`id\`) ON DELETE NO ACTION ON UPDATE NO ACTION
        `);
    await queryRunner.query(`
            ALTER TABLE \`reply_attempts\`
            ADD CONSTRAINT \`FK_d9ecf491582dc4a528afa6a0945\` FOREIGN KEY (\`created_by_id\`) REFERENCES \`users\`(\`id\`) ON DELETE NO ACTION ON UPDATE NO ACTION
        `);
    await queryRunner.query(`
            ALTER TABLE \`sources\`
            ADD CONSTRAINT \`FK_cfc865ece576b964e2cb98a1a05\` FOREIGN KEY (\`created_by_id\`) REFERENCES \`users\`(\`id\`) ON DELETE NO ACTION ON UPDATE NO ACTION
        `);
    await queryRunner.query(`
            ALTER TABLE \`claim_sources\`
            ADD CONSTRAINT \`FK_93972fe86eb1405ea5f0bf219d4\` FOREIGN KEY (\`claim_id\`) REFERENCES \`claims\`(\`id\`) ON DELETE NO ACTION ON UPDATE NO ACTION
        `);
    await queryRunner.query(`
            ALTER TABLE \`claim_sources\`
            ADD CONSTRAINT \`FK_35c28a0bbd2a67d4b3dd91f62a5\` FOREIGN KEY (\`source_id\`) REFERENCES \`sources\`(\`id\`) ON DELETE NO ACTION ON UPDATE NO ACTION
        `);
    await queryRunner.query(`
            ALTER TABLE \`claim_sources\`
            ADD CONSTRAINT \`FK_3ad0d0f4c47bc55a46e1f01bacf\` FOREIGN KEY (\`linked_by_id\`) REFERENCES \`users\`(\`id\`) ON DELETE NO ACTION ON UPDATE NO ACTION
        `);
  }

  public async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`
            ALTER TABLE \`claim_sources\` DROP FOREIGN KEY \`FK_3ad0d0f4c47bc55a46e1f01bacf\`
        `);
    await queryRunner.query(`
            ALTER TABLE \`claim_sources\` DROP FOREIGN KEY \`FK_35c28a0bbd2a67d4b3dd91f62a5\`
        `);
    await queryRunner.query(`
            ALTER TABLE \`claim_sources\` DROP FOREIGN KEY \`FK_93972fe86eb1405ea5f0bf219d4\`
        `);
    await queryRunner.query(`
            ALTER TABLE \`sources\` DROP FOREIGN KEY \`FK_cfc865ece576b964e2cb98a1a05\`
        `);
    await queryRunner.query(`
            ALTER TABLE \`reply_attempts\` DROP FOREIGN KEY \`FK_d9ecf491582dc4a528afa6a0945\`
        `);
    await queryRunner.query(`
            ALTER TABLE \`reply_attempts\` DROP FOREIGN KEY \`FK_cf07a74db6d612ee2b5cb5b59d1\`
        `);
    await queryRunner.query(`
            ALTER TABLE \`expert_consultations\` DROP FOREIGN KEY \`FK_539fa2d0b91336b21c75e78819b\`
        `);
    await queryRunner.query(`
            ALTER TABLE \`expert_consultations\` DROP FOREIGN KEY \`FK_2f4b4fcab20b22d6829589c6ca2\`
        `);
    await queryRunner.query(`
            ALTER TABLE \`comments\` DROP FOREIGN KEY \`FK_cd90453c0d69f858427204e45a3\`
        `);
    await queryRunner.query(`
            ALTER TABLE \`comments\` DROP FOREIGN KEY \`FK_25549ce5482606fd2b00c93d2f1\`
        `);
    await queryRunner.query(`
            ALTER TABLE \`appearances\` DROP FOREIGN KEY \`FK_0b14f5551c623cc6de582e1d093\`
        `);
    await queryRunner.query(`
            ALTER TABLE \`appearances\` DROP FOREIGN KEY \`FK_70aa78979c4ee71577a2220d6f0\`
        `);
    await queryRunner.query(`
            ALTER TABLE \`appearances\` DROP FOREIGN KEY \`FK_65236efa99eae89b998ed6c96b6\`
        `);
    await queryRunner.query(`
            ALTER TABLE \`attachments\` DROP FOREIGN KEY \`FK_70a38fc450d3b433c86b67e69d6\`
        `);
    await queryRunner.query(`
            ALTER TABLE \`attachments\` DROP FOREIGN KEY \`FK_cbe981fc721374dc41693a06992\`
        `);
    await queryRunner.query(`
            ALTER TABLE \`claims\` DROP FOREIGN KEY \`FK_d96370e6a5cf3ff628039d3624d\`
        `);
    await queryRunner.query(`
            ALTER TABLE \`claims\` DROP FOREIGN KEY \`FK_8490bdc93ac2749f5541aa792e4\`
        `);
    await queryRunner.query(`
            ALTER TABLE \`claims\` DROP FOREIGN KEY \`FK_d036d8b74e0510ea3779a504f90\`
        `);
    await queryRunner.query(`
            ALTER TABLE \`claim_topics\` DROP FOREIGN KEY \`FK_9faca90b36767e37e354b6c6421\`
        `);
    await queryRunner.query(`
            DROP INDEX \`IDX_audit_events_claim\` ON \`audit_events\`
        `);
    await queryRunner.query(`
            ALTER TABLE \`audit_events\` DROP COLUMN \`claim_id\`
        `);
    await queryRunner.query(`
            DROP INDEX \`IDX_claim_sources_source\` ON \`claim_sources\`
        `);
    await queryRunner.query(`
            DROP TABLE \`claim_sources\`
        `);
    await queryRunner.query(`
            DROP INDEX \`IDX_sources_doi\` ON \`sources\`
        `);
    await queryRunner.query(`
            DROP INDEX \`IDX_sources_title\` ON \`sources\`
        `);
    await queryRunner.query(`
            DROP TABLE \`sources\`
        `);
    await queryRunner.query(`
            DROP INDEX \`IDX_reply_attempts_claim\` ON \`reply_attempts\`
        `);
    await queryRunner.query(`
            DROP TABLE \`reply_attempts\`
        `);
    await queryRunner.query(`
            DROP INDEX \`IDX_expert_consultations_claim\` ON \`expert_consultations\`
        `);
    await queryRunner.query(`
            DROP TABLE \`expert_consultations\`
        `);
    await queryRunner.query(`
            DROP INDEX \`IDX_comments_claim\` ON \`comments\`
        `);
    await queryRunner.query(`
            DROP TABLE \`comments\`
        `);
    await queryRunner.query(`
            DROP INDEX \`IDX_appearances_claim\` ON \`appearances\`
        `);
    await queryRunner.query(`
            DROP TABLE \`appearances\`
        `);
    await queryRunner.query(`
            DROP INDEX \`IDX_attachments_claim\` ON \`attachments\`
        `);
    await queryRunner.query(`
            DROP INDEX \`IDX_attachments_sha256\` ON \`attachments\`
        `);
    await queryRunner.query(`
            DROP TABLE \`attachments\`
        `);
    await queryRunner.query(`
            DROP INDEX \`IDX_claims_filed_at\` ON \`claims\`
        `);
    await queryRunner.query(`
            DROP INDEX \`IDX_claims_updated_at\` ON \`claims\`
        `);
    await queryRunner.query(`
            DROP INDEX \`IDX_claims_status\` ON \`claims\`
        `);
    await queryRunner.query(`
            DROP INDEX \`IDX_claims_assignee\` ON \`claims\`
        `);
    await queryRunner.query(`
            DROP INDEX \`IDX_claims_filed_by\` ON \`claims\`
        `);
    await queryRunner.query(`
            DROP INDEX \`IDX_claims_claimant\` ON \`claims\`
        `);
    await queryRunner.query(`
            DROP INDEX \`IDX_claims_legal\` ON \`claims\`
        `);
    await queryRunner.query(`
            DROP TABLE \`claims\`
        `);
    await queryRunner.query(`
            DROP INDEX \`IDX_claim_topics_topic\` ON \`claim_topics\`
        `);
    await queryRunner.query(`
            DROP TABLE \`claim_topics\`
        `);
    await queryRunner.query(`
            DROP INDEX \`IDX_claimants_name\` ON \`claimants\`
        `);
    await queryRunner.query(`
            DROP TABLE \`claimants\`
        `);
  }
}
