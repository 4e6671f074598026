import type { MigrationInterface, QueryRunner } from 'typeorm';

/** Reader zone preference, "how to tell them apart" notes for look-alike pairs, learn-mode answers. */
export class Learning1796174000000 implements MigrationInterface {
  name = 'Learning1796174000000';

  public async up(q: QueryRunner): Promise<void> {
    await q.query(`ALTER TABLE \`users\` ADD \`hardiness_zone\` varchar(3) NULL`);
    await q.query(
      `CREATE TABLE \`pair_notes\` (\`id\` int UNSIGNED NOT NULL AUTO_INCREMENT, \`cultivar_a_id\` int UNSIGNED NOT NULL, \`cultivar_b_id\` int UNSIGNED NOT NULL, \`notes_html\` mediumtext NOT NULL, \`updated_by\` int UNSIGNED NULL, \`updated_at\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3) ON UPDATE CURRENT_TIMESTAMP(3), UNIQUE INDEX \`uq_pair_notes_pair\` (\`cultivar_a_id\`, \`cultivar_b_id\`), PRIMARY KEY (\`id\`)) ENGINE=InnoDB`,
    );
    await q.query(
      `CREATE TABLE \`learn_attempts\` (\`id\` int UNSIGNED NOT NULL AUTO_INCREMENT, \`user_id\` int UNSIGNED NOT NULL, \`stop_id\` int UNSIGNED NOT NULL, \`cultivar_id\` int UNSIGNED NOT NULL, \`chosen_id\` int UNSIGNED NOT NULL, \`correct\` tinyint NOT NULL, \`created_at\` datetime(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3), INDEX \`ix_learn_attempts_user\` (\`user_id\`, \`created_at\`), PRIMARY KEY (\`id\`)) ENGINE=InnoDB`,
    );
  }

  public async down(q: QueryRunner): Promise<void> {
    await q.query(`DROP TABLE \`learn_attempts\``);
    await q.query(`DROP TABLE \`pair_notes\``);
    await q.query(`ALTER TABLE \`users\` DROP COLUMN \`hardiness_zone\``);
  }
}
