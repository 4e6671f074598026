import { MigrationInterface, QueryRunner } from "typeorm";

export class CaptionsStops1796172673735 implements MigrationInterface {
    name = 'CaptionsStops1796172673735'

    public async up(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`CREATE TABLE \`caption_tracks\` (\`id\` int UNSIGNED NOT NULL AUTO_INCREMENT, \`tour_id\` int UNSIGNED NOT NULL, \`lang\` varchar(35) NOT NULL, \`label\` varchar(80) NOT NULL, \`version\` int UNSIGNED NOT NULL DEFAULT '1', \`updated_by\` int UNSIGNED NULL, \`updated_at\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3) ON UPDATE CURRENT_TIMESTAMP(3), UNIQUE INDEX \`uq_track_lang\` (\`tour_id\`, \`lang\`), PRIMARY KEY (\`id\`)) ENGINE=InnoDB`);
        await queryRunner.query(`CREATE TABLE \`cues\` (\`id\` int UNSIGNED NOT NULL AUTO_INCREMENT, \`track_id\` int UNSIGNED NOT NULL, \`seq\` int UNSIGNED NOT NULL, \`start_ms\` int UNSIGNED NOT NULL, \`end_ms\` int UNSIGNED NOT NULL, \`text\` text NOT NULL, \`settings\` varchar(255) NOT NULL DEFAULT '', \`cue_ident\` varchar(255) NULL, FULLTEXT INDEX \`ft_cues_text\` (\`text\`), INDEX \`ix_cues_track_start\` (\`track_id\`, \`start_ms\`), PRIMARY KEY (\`id\`)) ENGINE=InnoDB`);
        await queryRunner.query(`CREATE TABLE \`cultivars\` (\`id\` int UNSIGNED NOT NULL AUTO_INCREMENT, \`slug\` varchar(160) NOT NULL, \`genus\` varchar(60) NOT NULL, \`species\` varchar(60) NULL, \`infraspecific_rank\` varchar(12) NULL, \`infraspecific_epithet\` varchar(60) NULL, \`group_name\` varchar(80) NULL, \`epithet\` varchar(80) NOT NULL, \`accepted_name\` varchar(255) NOT NULL, \`status\` enum ('proposed', 'approved', 'retired') NOT NULL DEFAULT 'approved', \`merged_into_id\` int UNSIGNED NULL, \`traits\` json NULL, \`notes_html\` mediumtext NOT NULL, \`pronunciation\` varchar(200) NULL, \`meaning\` text NULL, \`fictional\` tinyint NOT NULL DEFAULT 0, \`created_by\` int UNSIGNED NULL, \`created_at\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3), \`updated_at\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3) ON UPDATE CURRENT_TIMESTAMP(3), UNIQUE INDEX \`uq_cultivars_slug\` (\`slug\`), INDEX \`ix_cultivars_status_name\` (\`status\`, \`accepted_name\`), PRIMARY KEY (\`id\`)) ENGINE=InnoDB`);
        await queryRunner.query(`CREATE TABLE \`cultivar_variants\` (\`id\` int UNSIGNED NOT NULL AUTO_INCREMENT, \`cultivar_id\` int UNSIGNED NOT NULL, \`text\` varchar(120) NOT NULL, \`normalized\` varchar(120) NOT NULL, \`created_at\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3), INDEX \`ix_variant_normalized\` (\`normalized\`), UNIQUE INDEX \`uq_variant_per_cultivar\` (\`cultivar_id\`, \`normalized\`), PRIMARY KEY (\`id\`)) ENGINE=InnoDB`);
        await queryRunner.query(`CREATE TABLE \`stops\` (\`id\` int UNSIGNED NOT NULL AUTO_INCREMENT, \`tour_id\` int UNSIGNED NOT NULL, \`start_ms\` int UNSIGNED NOT NULL, \`end_ms\` int UNSIGNED NOT NULL, \`title\` varchar(160) NOT NULL, \`cultivar_id\` int UNSIGNED NULL, \`updated_at\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3) ON UPDATE CURRENT_TIMESTAMP(3), INDEX \`ix_stops_cultivar\` (\`cultivar_id\`), INDEX \`ix_stops_tour_start\` (\`tour_id\`, \`start_ms\`), PRIMARY KEY (\`id\`)) ENGINE=InnoDB`);
        await queryRunner.query(`ALTER TABLE \`caption_tracks\` ADD CONSTRAINT \`FK_93f8d074fbd5e934a843d1e8dd6\` FOREIGN KEY (\`tour_id\`) REFERENCES \`tours\`(\`id\`) ON DELETE CASCADE ON UPDATE NO ACTION`);
        await queryRunner.query(`ALTER TABLE \`cues\` ADD CONSTRAINT \`FK_fc5de962058e56c90c510346a12\` FOREIGN KEY (\`track_id\`) REFERENCES \`caption_tracks\`(\`id\`) ON DELETE CASCADE ON UPDATE NO ACTION`);
        await queryRunner.query(`ALTER TABLE \`cultivars\` ADD CONSTRAINT \`FK_39aa6af28ec848597eb9fbda549\` FOREIGN KEY (\`created_by\`) REFERENCES \`users\`(\`id\`) ON DELETE SET NULL ON UPDATE NO ACTION`);
        await queryRunner.query(`ALTER TABLE \`cultivar_variants\` ADD CONSTRAINT \`FK_3be3d0860b33b54c60c3658d0bc\` FOREIGN KEY (\`cultivar_id\`) REFERENCES \`cultivars\`(\`id\`) ON DELETE CASCADE ON UPDATE NO ACTION`);
        await queryRunner.query(`ALTER TABLE \`stops\` ADD CONSTRAINT \`FK_71c60af4ef4e00a55232e90d0b2\` FOREIGN KEY (\`tour_id\`) REFERENCES \`tours\`(\`id\`) ON DELETE CASCADE ON UPDATE NO ACTION`);
        await queryRunner.query(`ALTER TABLE \`stops\` ADD CONSTRAINT \`FK_7dd236e5a94b161ad6ec7db59db\` FOREIGN KEY (\`cultivar_id\`) REFERENCES \`cultivars\`(\`id\`) ON DELETE RESTRICT ON UPDATE NO ACTION`);
    }

    public async down(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`ALTER TABLE \`stops\` DROP FOREIGN KEY \`FK_7dd236e5a94b161ad6ec7db59db\``);
        await queryRunner.query(`ALTER TABLE \`stops\` DROP FOREIGN KEY \`FK_71c60af4ef4e00a55232e90d0b2\``);
        await queryRunner.query(`ALTER TABLE \`cultivar_variants\` DROP FOREIGN KEY \`FK_3be3d0860b33b54c60c3658d0bc\``);
        await queryRunner.query(`ALTER TABLE \`cultivars\` DROP FOREIGN KEY \`FK_39aa6af28ec848597eb9fbda549\``);
        await queryRunner.query(`ALTER TABLE \`cues\` DROP FOREIGN KEY \`FK_fc5de962058e56c90c510346a12\``);
        await queryRunner.query(`ALTER TABLE \`caption_tracks\` DROP FOREIGN KEY \`FK_93f8d074fbd5e934a843d1e8dd6\``);
        await queryRunner.query(`DROP INDEX \`ix_stops_tour_start\` ON \`stops\``);
        await queryRunner.query(`DROP INDEX \`ix_stops_cultivar\` ON \`stops\``);
        await queryRunner.query(`DROP TABLE \`stops\``);
        await queryRunner.query(`DROP INDEX \`uq_variant_per_cultivar\` ON \`cultivar_variants\``);
        await queryRunner.query(`DROP INDEX \`ix_variant_normalized\` ON \`cultivar_variants\``);
        await queryRunner.query(`DROP TABLE \`cultivar_variants\``);
        await queryRunner.query(`DROP INDEX \`ix_cultivars_status_name\` ON \`cultivars\``);
        await queryRunner.query(`DROP INDEX \`uq_cultivars_slug\` ON \`cultivars\``);
        await queryRunner.query(`DROP TABLE \`cultivars\``);
        await queryRunner.query(`DROP INDEX \`ix_cues_track_start\` ON \`cues\``);
        await queryRunner.query(`DROP INDEX \`ft_cues_text\` ON \`cues\``);
        await queryRunner.query(`DROP TABLE \`cues\``);
        await queryRunner.query(`DROP INDEX \`uq_track_lang\` ON \`caption_tracks\``);
        await queryRunner.query(`DROP TABLE \`caption_tracks\``);
    }

}
