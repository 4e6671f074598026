import { MigrationInterface, QueryRunner } from "typeorm";

export class Initial1796171327127 implements MigrationInterface {
    name = 'Initial1796171327127'

    public async up(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`CREATE TABLE \`users\` (\`id\` int UNSIGNED NOT NULL AUTO_INCREMENT, \`email\` varchar(254) NOT NULL, \`display_name\` varchar(60) NOT NULL, \`password_hash\` varchar(100) NOT NULL, \`role\` enum ('viewer', 'author', 'moderator', 'admin') NOT NULL DEFAULT 'viewer', \`email_verified_at\` datetime(3) NULL, \`disabled_at\` datetime(3) NULL, \`unit_system\` enum ('metric', 'imperial') NOT NULL DEFAULT 'metric', \`garden\` varchar(120) NULL, \`session_epoch\` int UNSIGNED NOT NULL DEFAULT '0', \`created_at\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(6), \`updated_at\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(6) ON UPDATE CURRENT_TIMESTAMP(6), UNIQUE INDEX \`uq_users_email\` (\`email\`), PRIMARY KEY (\`id\`)) ENGINE=InnoDB`);
        await queryRunner.query(`CREATE TABLE \`auth_tokens\` (\`id\` int UNSIGNED NOT NULL AUTO_INCREMENT, \`user_id\` int UNSIGNED NOT NULL, \`purpose\` enum ('verify', 'reset') NOT NULL, \`token_hash\` char(64) NOT NULL, \`expires_at\` datetime(3) NOT NULL, \`used_at\` datetime(3) NULL, \`created_at\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(6), UNIQUE INDEX \`uq_auth_tokens_hash\` (\`token_hash\`), PRIMARY KEY (\`id\`)) ENGINE=InnoDB`);
        await queryRunner.query(`CREATE TABLE \`clubs\` (\`id\` int UNSIGNED NOT NULL AUTO_INCREMENT, \`name\` varchar(120) NOT NULL, \`blurb\` text NOT NULL, \`fictional\` tinyint NOT NULL DEFAULT 0, PRIMARY KEY (\`id\`)) ENGINE=InnoDB`);
        await queryRunner.query(`CREATE TABLE \`outbox_messages\` (\`id\` int UNSIGNED NOT NULL AUTO_INCREMENT, \`to_address\` varchar(500) NOT NULL, \`from_address\` varchar(500) NOT NULL, \`subject\` varchar(500) NOT NULL, \`text\` mediumtext NOT NULL, \`html\` mediumtext NULL, \`received_at\` datetime(3) NOT NULL, INDEX \`ix_outbox_to\` (\`to_address\`), PRIMARY KEY (\`id\`)) ENGINE=InnoDB`);
        await queryRunner.query(`ALTER TABLE \`auth_tokens\` ADD CONSTRAINT \`FK_9691367d446cd8b18f462c191b3\` FOREIGN KEY (\`user_id\`) REFERENCES \`users\`(\`id\`) ON DELETE CASCADE ON UPDATE NO ACTION`);
    }

    public async down(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`ALTER TABLE \`auth_tokens\` DROP FOREIGN KEY \`FK_9691367d446cd8b18f462c191b3\``);
        await queryRunner.query(`DROP INDEX \`ix_outbox_to\` ON \`outbox_messages\``);
        await queryRunner.query(`DROP TABLE \`outbox_messages\``);
        await queryRunner.query(`DROP TABLE \`clubs\``);
        await queryRunner.query(`DROP INDEX \`uq_auth_tokens_hash\` ON \`auth_tokens\``);
        await queryRunner.query(`DROP TABLE \`auth_tokens\``);
        await queryRunner.query(`DROP INDEX \`uq_users_email\` ON \`users\``);
        await queryRunner.query(`DROP TABLE \`users\``);
    }

}
