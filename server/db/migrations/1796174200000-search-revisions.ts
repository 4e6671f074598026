import { MigrationInterface, QueryRunner } from "typeorm";

/**
 * What search keeps in memory is checked against one row per kind: triggers set a fresh value
 * whenever the records, their spellings, or the published tours (and their authors' names) change,
 * in the same transaction as the change (issue 6: search).
 */
const BUMP = (name: string) => `INSERT INTO \`search_revisions\` (\`name\`, \`revision\`) VALUES ('${name}', UUID()) ON DUPLICATE KEY UPDATE \`revision\` = UUID()`;
const BUMP_WHEN = (name: string, when: string) => `INSERT INTO \`search_revisions\` (\`name\`, \`revision\`) SELECT '${name}', UUID() FROM DUAL WHERE ${when} ON DUPLICATE KEY UPDATE \`revision\` = UUID()`;

const TRIGGERS: [name: string, event: string, table: string, body: string][] = [
    ['trg_cultivars_ai_search', 'INSERT', 'cultivars', BUMP('catalogue')],
    ['trg_cultivars_au_search', 'UPDATE', 'cultivars', BUMP('catalogue')],
    ['trg_cultivars_ad_search', 'DELETE', 'cultivars', BUMP('catalogue')],
    ['trg_cultivar_variants_ai_search', 'INSERT', 'cultivar_variants', BUMP('catalogue')],
    ['trg_cultivar_variants_au_search', 'UPDATE', 'cultivar_variants', BUMP('catalogue')],
    ['trg_cultivar_variants_ad_search', 'DELETE', 'cultivar_variants', BUMP('catalogue')],
    ['trg_tours_ai_search', 'INSERT', 'tours', BUMP_WHEN('tours', `NEW.\`state\` = 'published'`)],
    ['trg_tours_au_search', 'UPDATE', 'tours', BUMP_WHEN('tours', `OLD.\`state\` = 'published' OR NEW.\`state\` = 'published'`)],
    ['trg_tours_ad_search', 'DELETE', 'tours', BUMP_WHEN('tours', `OLD.\`state\` = 'published'`)],
    // Compared as bytes: the column's collation would call a change of capitals or accents no change.
    ['trg_users_au_search', 'UPDATE', 'users', BUMP_WHEN('tours', `NOT (BINARY OLD.\`display_name\` <=> BINARY NEW.\`display_name\`)`)],
];

export class SearchRevisions1796174200000 implements MigrationInterface {
    name = 'SearchRevisions1796174200000'

    public async up(queryRunner: QueryRunner): Promise<void> {
        await queryRunner.query(`CREATE TABLE \`search_revisions\` (\`name\` varchar(32) NOT NULL, \`revision\` char(36) NOT NULL, PRIMARY KEY (\`name\`)) ENGINE=InnoDB`);
        // A first value for each, so a database that already holds records and tours starts with one.
        await queryRunner.query(`INSERT INTO \`search_revisions\` (\`name\`, \`revision\`) VALUES ('catalogue', UUID()), ('tours', UUID())`);
        for (const [name, event, table, body] of TRIGGERS) {
            await queryRunner.query(`CREATE TRIGGER \`${name}\` AFTER ${event} ON \`${table}\` FOR EACH ROW ${body}`);
        }
    }

    public async down(queryRunner: QueryRunner): Promise<void> {
        for (const [name] of [...TRIGGERS].reverse()) await queryRunner.query(`DROP TRIGGER IF EXISTS \`${name}\``);
        await queryRunner.query(`DROP TABLE \`search_revisions\``);
    }

}
