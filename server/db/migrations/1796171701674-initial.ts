import { MigrationInterface, QueryRunner } from "typeorm";

export class Initial1796171701674 implements MigrationInterface {
    name = 'Initial1796171701674'

    public async up(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`CREATE TABLE \`users\` (\`id\` int UNSIGNED NOT NULL AUTO_INCREMENT, \`email\` varchar(254) NOT NULL, \`display_name\` varchar(60) NOT NULL, \`password_hash\` varchar(100) NOT NULL, \`role\` enum ('viewer', 'author', 'moderator', 'admin') NOT NULL DEFAULT 'viewer', \`email_verified_at\` datetime(3) NULL, \`disabled_at\` datetime(3) NULL, \`unit_system\` enum ('metric', 'imperial') NOT NULL DEFAULT 'metric', \`garden\` varchar(120) NULL, \`session_epoch\` int UNSIGNED NOT NULL DEFAULT '0', \`created_at\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3), \`updated_at\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3) ON UPDATE CURRENT_TIMESTAMP(3), UNIQUE INDEX \`uq_users_email\` (\`email\`), PRIMARY KEY (\`id\`)) ENGINE=InnoDB`);
        await queryRunner.query(`CREATE TABLE \`auth_tokens\` (\`id\` int UNSIGNED NOT NULL AUTO_INCREMENT, \`user_id\` int UNSIGNED NOT NULL, \`purpose\` enum ('verify', 'reset') NOT NULL, \`token_hash\` char(64) NOT NULL, \`expires_at\` datetime(3) NOT NULL, \`used_at\` datetime(3) NULL, \`created_at\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3), UNIQUE INDEX \`uq_auth_tokens_hash\` (\`token_hash\`), PRIMARY KEY (\`id\`)) ENGINE=InnoDB`);
        await queryRunner.query(`CREATE TABLE \`clubs\` (\`id\` int UNSIGNED NOT NULL AUTO_INCREMENT, \`name\` varchar(120) NOT NULL, \`blurb\` text NOT NULL, \`fictional\` tinyint NOT NULL DEFAULT 0, PRIMARY KEY (\`id\`)) ENGINE=InnoDB`);
        await queryRunner.query(`CREATE TABLE \`jobs\` (\`id\` int UNSIGNED NOT NULL AUTO_INCREMENT, \`kind\` varchar(40) NOT NULL, \`subject_type\` varchar(40) NOT NULL, \`subject_id\` int UNSIGNED NOT NULL, \`payload\` json NOT NULL, \`state\` enum ('queued', 'running', 'done', 'failed', 'cancelled') NOT NULL DEFAULT 'queued', \`attempts\` smallint UNSIGNED NOT NULL DEFAULT '0', \`max_attempts\` smallint UNSIGNED NOT NULL DEFAULT '3', \`progress\` float NOT NULL DEFAULT '0', \`eta_seconds\` int UNSIGNED NULL, \`error\` text NULL, \`lease_holder\` varchar(120) NULL, \`heartbeat_at\` datetime(3) NULL, \`run_after\` datetime(3) NOT NULL, \`finished_at\` datetime(3) NULL, \`created_at\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3), \`updated_at\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3) ON UPDATE CURRENT_TIMESTAMP(3), INDEX \`ix_jobs_subject\` (\`subject_type\`, \`subject_id\`), INDEX \`ix_jobs_claim\` (\`state\`, \`run_after\`), PRIMARY KEY (\`id\`)) ENGINE=InnoDB`);
        await queryRunner.query(`CREATE TABLE \`outbox_messages\` (\`id\` int UNSIGNED NOT NULL AUTO_INCREMENT, \`to_address\` varchar(500) NOT NULL, \`from_address\` varchar(500) NOT NULL, \`subject\` varchar(500) NOT NULL, \`text\` mediumtext NOT NULL, \`html\` mediumtext NULL, \`received_at\` datetime(3) NOT NULL, INDEX \`ix_outbox_to\` (\`to_address\`), PRIMARY KEY (\`id\`)) ENGINE=InnoDB`);
        await queryRunner.query(`CREATE TABLE \`tours\` (\`id\` int UNSIGNED NOT NULL AUTO_INCREMENT, \`author_id\` int UNSIGNED NOT NULL, \`title\` varchar(160) NOT NULL, \`description_html\` mediumtext NOT NULL, \`garden\` varchar(160) NOT NULL DEFAULT '', \`filmed_on\` date NULL, \`state\` enum ('draft', 'processing', 'ready', 'failed', 'published') NOT NULL DEFAULT 'draft', \`published_at\` datetime(3) NULL, \`source_file\` varchar(300) NULL, \`source_name\` varchar(255) NULL, \`source_bytes\` bigint UNSIGNED NULL, \`duration_ms\` int UNSIGNED NULL, \`width\` smallint UNSIGNED NULL, \`height\` smallint UNSIGNED NULL, \`source_codecs\` varchar(120) NULL, \`media_dir\` varchar(300) NULL, \`renditions\` json NULL, \`poster_file\` varchar(120) NULL, \`thumb_strip\` json NULL, \`failure_reason\` text NULL, \`created_at\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3), \`updated_at\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3) ON UPDATE CURRENT_TIMESTAMP(3), INDEX \`ix_tours_state_published\` (\`state\`, \`published_at\`), PRIMARY KEY (\`id\`)) ENGINE=InnoDB`);
        await queryRunner.query(`ALTER TABLE \`auth_tokens\` ADD CONSTRAINT \`FK_9691367d446cd8b18f462c191b3\` FOREIGN KEY (\`user_id\`) REFERENCES \`users\`(\`id\`) ON DELETE CASCADE ON UPDATE NO ACTION`);
        await queryRunner.query(`ALTER TABLE \`tours\` ADD CONSTRAINT \`FK_4c6a6bf6f071aee74ae2a4fa703\` FOREIGN KEY (\`author_id\`) REFERENCES \`users\`(\`id\`) ON DELETE RESTRICT ON UPDATE NO ACTION`);
    }

    public async down(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`ALTER TABLE \`tours\` DROP FOREIGN KEY \`FK_4c6a6bf6f071aee74ae2a4fa703\``);
        await queryRunner.query(`ALTER TABLE \`auth_tokens\` DROP FOREIGN KEY \`FK_9691367d446cd8b18f462c191b3\``);
        await queryRunner.query(`DROP INDEX \`ix_tours_state_published\` ON \`tours\``);
        await queryRunner.query(`DROP TABLE \`tours\``);
        await queryRunner.query(`DROP INDEX \`ix_outbox_to\` ON \`outbox_messages\``);
        await queryRunner.query(`DROP TABLE \`outbox_messages\``);
        await queryRunner.query(`DROP INDEX \`ix_jobs_claim\` ON \`jobs\``);
        await queryRunner.query(`DROP INDEX \`ix_jobs_subject\` ON \`jobs\``);
        await queryRunner.query(`DROP TABLE \`jobs\``);
        await queryRunner.query(`DROP TABLE \`clubs\``);
        await queryRunner.query(`DROP INDEX \`uq_auth_tokens_hash\` ON \`auth_tokens\``);
        await queryRunner.query(`DROP TABLE \`auth_tokens\``);
        await queryRunner.query(`DROP INDEX \`uq_users_email\` ON \`users\``);
        await queryRunner.query(`DROP TABLE \`users\``);
    }

}
