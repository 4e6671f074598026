import { MigrationInterface, QueryRunner } from "typeorm";

/** Cultivar photos, spelling fixes and their per-cue audit (issue 5: names). */
export class SpellingFixes1796174100000 implements MigrationInterface {
    name = 'SpellingFixes1796174100000'

    public async up(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`CREATE TABLE \`cultivar_photos\` (\`id\` int UNSIGNED NOT NULL AUTO_INCREMENT, \`cultivar_id\` int UNSIGNED NOT NULL, \`file\` varchar(200) NOT NULL, \`thumb_file\` varchar(200) NOT NULL, \`width\` smallint UNSIGNED NOT NULL, \`height\` smallint UNSIGNED NOT NULL, \`thumb_width\` smallint UNSIGNED NOT NULL, \`thumb_height\` smallint UNSIGNED NOT NULL, \`alt_text\` varchar(300) NOT NULL, \`position\` int UNSIGNED NOT NULL DEFAULT '0', \`created_at\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3), INDEX \`ix_cultivar_photos_position\` (\`cultivar_id\`, \`position\`), PRIMARY KEY (\`id\`)) ENGINE=InnoDB`);
        await queryRunner.query(`CREATE TABLE \`spelling_fixes\` (\`id\` int UNSIGNED NOT NULL AUTO_INCREMENT, \`proposed_text\` varchar(120) NOT NULL, \`proposed_normalized\` varchar(120) NOT NULL, \`cultivar_id\` int UNSIGNED NOT NULL, \`suggestion\` varchar(80) NOT NULL, \`source\` enum ('viewer', 'detection') NOT NULL, \`proposer_id\` int UNSIGNED NULL, \`cue_id\` int UNSIGNED NULL, \`track_id\` int UNSIGNED NULL, \`status\` enum ('open', 'accepted', 'declined', 'undone') NOT NULL DEFAULT 'open', \`open_guard\` tinyint UNSIGNED NULL DEFAULT '1', \`decline_reason\` varchar(500) NULL, \`added_variant_id\` int UNSIGNED NULL, \`decided_by\` int UNSIGNED NULL, \`decided_at\` datetime(3) NULL, \`undone_by\` int UNSIGNED NULL, \`undone_at\` datetime(3) NULL, \`created_at\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3), INDEX \`ix_spelling_fix_status_created\` (\`status\`, \`created_at\`), UNIQUE INDEX \`uq_spelling_fix_open\` (\`cultivar_id\`, \`proposed_normalized\`, \`open_guard\`), PRIMARY KEY (\`id\`)) ENGINE=InnoDB`);
        await queryRunner.query(`CREATE TABLE \`spelling_fix_changes\` (\`id\` int UNSIGNED NOT NULL AUTO_INCREMENT, \`fix_id\` int UNSIGNED NOT NULL, \`cue_id\` int UNSIGNED NOT NULL, \`track_id\` int UNSIGNED NOT NULL, \`start_ms\` int UNSIGNED NOT NULL, \`end_ms\` int UNSIGNED NOT NULL, \`before_text\` text NOT NULL, \`after_text\` text NOT NULL, \`created_at\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3), INDEX \`ix_spelling_fix_changes_track\` (\`track_id\`), INDEX \`ix_spelling_fix_changes_fix\` (\`fix_id\`, \`cue_id\`), PRIMARY KEY (\`id\`)) ENGINE=InnoDB`);
        await queryRunner.query(`ALTER TABLE \`cultivar_photos\` ADD CONSTRAINT \`FK_012d5356b380153750e084f9cfb\` FOREIGN KEY (\`cultivar_id\`) REFERENCES \`cultivars\`(\`id\`) ON DELETE CASCADE ON UPDATE NO ACTION`);
        await queryRunner.query(`ALTER TABLE \`spelling_fixes\` ADD CONSTRAINT \`FK_707146a6deb02885dc74913ca8f\` FOREIGN KEY (\`cultivar_id\`) REFERENCES \`cultivars\`(\`id\`) ON DELETE CASCADE ON UPDATE NO ACTION`);
        await queryRunner.query(`ALTER TABLE \`spelling_fixes\` ADD CONSTRAINT \`FK_51b51c41c4ed40acc2d45ac8abd\` FOREIGN KEY (\`proposer_id\`) REFERENCES \`users\`(\`id\`) ON DELETE SET NULL ON UPDATE NO ACTION`);
        await queryRunner.query(`ALTER TABLE \`spelling_fixes\` ADD CONSTRAINT \`FK_f8ecf1ea9b6d72dc7f343a79e0b\` FOREIGN KEY (\`track_id\`) REFERENCES \`caption_tracks\`(\`id\`) ON DELETE SET NULL ON UPDATE NO ACTION`);
        await queryRunner.query(`ALTER TABLE \`spelling_fixes\` ADD CONSTRAINT \`FK_94f2e1343c5a66d8317b5884748\` FOREIGN KEY (\`decided_by\`) REFERENCES \`users\`(\`id\`) ON DELETE SET NULL ON UPDATE NO ACTION`);
        await queryRunner.query(`ALTER TABLE \`spelling_fixes\` ADD CONSTRAINT \`FK_51b0d0619c9d0e480c8bf36ef38\` FOREIGN KEY (\`undone_by\`) REFERENCES \`users\`(\`id\`) ON DELETE SET NULL ON UPDATE NO ACTION`);
        await queryRunner.query(`ALTER TABLE \`spelling_fix_changes\` ADD CONSTRAINT \`FK_e8c3fe0b1db1169f78ca784a0d7\` FOREIGN KEY (\`fix_id\`) REFERENCES \`spelling_fixes\`(\`id\`) ON DELETE CASCADE ON UPDATE NO ACTION`);
    }

    public async down(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`ALTER TABLE \`spelling_fix_changes\` DROP FOREIGN KEY \`FK_e8c3fe0b1db1169f78ca784a0d7\``);
        await queryRunner.query(`ALTER TABLE \`spelling_fixes\` DROP FOREIGN KEY \`FK_51b0d0619c9d0e480c8bf36ef38\``);
        await queryRunner.query(`ALTER TABLE \`spelling_fixes\` DROP FOREIGN KEY \`FK_94f2e1343c5a66d8317b5884748\``);
        await queryRunner.query(`ALTER TABLE \`spelling_fixes\` DROP FOREIGN KEY \`FK_f8ecf1ea9b6d72dc7f343a79e0b\``);
        await queryRunner.query(`ALTER TABLE \`spelling_fixes\` DROP FOREIGN KEY \`FK_51b51c41c4ed40acc2d45ac8abd\``);
        await queryRunner.query(`ALTER TABLE \`spelling_fixes\` DROP FOREIGN KEY \`FK_707146a6deb02885dc74913ca8f\``);
        await queryRunner.query(`ALTER TABLE \`cultivar_photos\` DROP FOREIGN KEY \`FK_012d5356b380153750e084f9cfb\``);
        await queryRunner.query(`DROP INDEX \`ix_spelling_fix_changes_fix\` ON \`spelling_fix_changes\``);
        await queryRunner.query(`DROP INDEX \`ix_spelling_fix_changes_track\` ON \`spelling_fix_changes\``);
        await queryRunner.query(`DROP TABLE \`spelling_fix_changes\``);
        await queryRunner.query(`DROP INDEX \`uq_spelling_fix_open\` ON \`spelling_fixes\``);
        await queryRunner.query(`DROP INDEX \`ix_spelling_fix_status_created\` ON \`spelling_fixes\``);
        await queryRunner.query(`DROP TABLE \`spelling_fixes\``);
        await queryRunner.query(`DROP INDEX \`ix_cultivar_photos_position\` ON \`cultivar_photos\``);
        await queryRunner.query(`DROP TABLE \`cultivar_photos\``);
    }

}
