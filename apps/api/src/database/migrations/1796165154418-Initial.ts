import { MigrationInterface, QueryRunner } from 'typeorm';

export class Initial1796165154418 implements MigrationInterface {
  name = 'Initial1796165154418';

  public async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`
            CREATE TABLE \`audit_events\` (
                \`id\` uuid NOT NULL,
                \`actor_id\` uuid NULL,
                \`action\` varchar(64) NOT NULL,
                \`entity_type\` varchar(64) NOT NULL,
                \`entity_id\` uuid NOT NULL,
                \`summary\` json NOT NULL,
                \`at\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
                INDEX \`IDX_audit_events_at\` (\`at\`),
                INDEX \`IDX_audit_events_entity\` (\`entity_type\`, \`entity_id\`, \`at\`),
                PRIMARY KEY (\`id\`)
            ) ENGINE = InnoDB
        `);
    await queryRunner.query(`
            CREATE TABLE \`users\` (
                \`id\` uuid NOT NULL,
                \`email\` varchar(254) NOT NULL,
                \`display_name\` varchar(120) NOT NULL,
                \`role\` enum (
                    'reporter',
                    'science_editor',
                    'copy_desk',
                    'desk_chief'
                ) NOT NULL,
                \`status\` enum ('invited', 'active', 'disabled') NOT NULL DEFAULT 'invited',
                \`password_hash\` varchar(255) NULL,
                \`failed_sign_ins\` int UNSIGNED NOT NULL DEFAULT '0',
                \`locked_until\` datetime(3) NULL,
                \`last_sign_in_at\` datetime(3) NULL,
                \`created_at\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
                \`updated_at\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3) ON UPDATE CURRENT_TIMESTAMP(3),
                \`version\` int NOT NULL,
                UNIQUE INDEX \`UQ_users_email\` (\`email\`),
                PRIMARY KEY (\`id\`)
            ) ENGINE = InnoDB
        `);
    await queryRunner.query(`
            CREATE TABLE \`refresh_tokens\` (
                \`id\` uuid NOT NULL,
                \`user_id\` uuid NOT NULL,
                \`family_id\` uuid NOT NULL,
                \`token_hash\` char(64) NOT NULL,
                \`expires_at\` datetime(3) NOT NULL,
                \`replaced_at\` datetime(3) NULL,
                \`revoked_at\` datetime(3) NULL,
                \`created_at\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
                UNIQUE INDEX \`UQ_refresh_tokens_hash\` (\`token_hash\`),
                INDEX \`IDX_refresh_tokens_family\` (\`family_id\`),
                PRIMARY KEY (\`id\`)
            ) ENGINE = InnoDB
        `);
    await queryRunner.query(`
            CREATE TABLE \`outbox_messages\` (
                \`id\` uuid NOT NULL,
                \`kind\` varchar(64) NOT NULL,
                \`to_address\` varchar(254) NOT NULL,
                \`subject\` varchar(255) NOT NULL,
                \`text_body\` mediumtext NOT NULL,
                \`html_body\` mediumtext NULL,
                \`state\` enum ('pending', 'sending', 'sent', 'failed') NOT NULL DEFAULT 'pending',
                \`attempts\` int UNSIGNED NOT NULL DEFAULT '0',
                \`next_attempt_at\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
                \`claim_id\` uuid NULL,
                \`claimed_at\` datetime(3) NULL,
                \`last_error\` text NULL,
                \`sent_at\` datetime(3) NULL,
                \`created_at\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
                \`updated_at\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3) ON UPDATE CURRENT_TIMESTAMP(3),
                INDEX \`IDX_outbox_messages_due\` (\`state\`, \`next_attempt_at\`),
                PRIMARY KEY (\`id\`)
            ) ENGINE = InnoDB
        `);
    await queryRunner.query(`
            CREATE TABLE \`one_time_tokens\` (
                \`id\` uuid NOT NULL,
                \`user_id\` uuid NOT NULL,
                \`purpose\` enum ('invitation', 'password_reset') NOT NULL,
                \`token_hash\` char(64) NOT NULL,
                \`expires_at\` datetime(3) NOT NULL,
                \`used_at\` datetime(3) NULL,
                \`created_at\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
                UNIQUE INDEX \`UQ_one_time_tokens_hash\` (\`token_hash\`),
                INDEX \`IDX_one_time_tokens_user_purpose\` (\`user_id\`, \`purpose\`),
                PRIMARY KEY (\`id\`)
            ) ENGINE = InnoDB
        `);
    await queryRunner.query(`
            ALTER TABLE \`refresh_tokens\`
            ADD CONSTRAINT \`FK_3ddc983c5f7bcf132fd8732c3f4\` FOREIGN KEY (\`user_id\`) REFERENCES \`users\`(\`id\`) ON DELETE CASCADE ON UPDATE NO ACTION
        `);
    await queryRunner.query(`
            ALTER TABLE \`one_time_tokens\`
            ADD CONSTRAINT \`FK_0dc2deee64e514ad6f7e69504e1\` FOREIGN KEY (\`user_id\`) REFERENCES \`users\`(\`id\`) ON DELETE CASCADE ON UPDATE NO ACTION
        `);
  }

  public async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`
            ALTER TABLE \`one_time_tokens\` DROP FOREIGN KEY \`FK_0dc2deee64e514ad6f7e69504e1\`
        `);
    await queryRunner.query(`
            ALTER TABLE \`refresh_tokens\` DROP FOREIGN KEY \`FK_3ddc983c5f7bcf132fd8732c3f4\`
        `);
    await queryRunner.query(`
            DROP INDEX \`IDX_one_time_tokens_user_purpose\` ON \`one_time_tokens\`
        `);
    await queryRunner.query(`
            DROP INDEX \`UQ_one_time_tokens_hash\` ON \`one_time_tokens\`
        `);
    await queryRunner.query(`
            DROP TABLE \`one_time_tokens\`
        `);
    await queryRunner.query(`
            DROP INDEX \`IDX_outbox_messages_due\` ON \`outbox_messages\`
        `);
    await queryRunner.query(`
            DROP TABLE \`outbox_messages\`
        `);
    await queryRunner.query(`
            DROP INDEX \`IDX_refresh_tokens_family\` ON \`refresh_tokens\`
        `);
    await queryRunner.query(`
            DROP INDEX \`UQ_refresh_tokens_hash\` ON \`refresh_tokens\`
        `);
    await queryRunner.query(`
            DROP TABLE \`refresh_tokens\`
        `);
    await queryRunner.query(`
            DROP INDEX \`UQ_users_email\` ON \`users\`
        `);
    await queryRunner.query(`
            DROP TABLE \`users\`
        `);
    await queryRunner.query(`
            DROP INDEX \`IDX_audit_events_entity\` ON \`audit_events\`
        `);
    await queryRunner.query(`
            DROP INDEX \`IDX_audit_events_at\` ON \`audit_events\`
        `);
    await queryRunner.query(`
            DROP TABLE \`audit_events\`
        `);
  }
}
