import path from 'node:path';
import { loadConfig, ROOT, type Config } from '../../server/config';

/** Where the tests' own MariaDB lives: apart from the developer's data, on its own port. */
export const TEST_DATA_DIR = path.join(ROOT, '.data', 'test');
export const TEST_DB_PORT = 3408;
/** One id per test run, so two runs on one machine never share (or drop) each other's databases. */
process.env.GROVEWALK_TEST_RUN ??= String(process.pid);
const RUN = process.env.GROVEWALK_TEST_RUN;
export const INT_DB = `grovewalk_test_int_${RUN}`;
export const E2E_DB = `grovewalk_test_e2e_${RUN}`;
export const E2E_PORT = 5190;
export const E2E_SMTP_PORT = 2591;
export const INT_SMTP_PORT = 2590;

/** The environment the tests' servers run with (integration in-process, e2e as a child). */
export function testEnv(dbName: string, extra: Record<string, string> = {}): Record<string, string> {
  return {
    NODE_ENV: 'test',
    DATA_DIR: TEST_DATA_DIR,
    MEDIA_DIR: path.join(TEST_DATA_DIR, `media-${dbName}`),
    DB_PORT: String(TEST_DB_PORT),
    DB_NAME: dbName,
    DB_USER: 'grovewalk_test',
    BCRYPT_COST: '4',
    SIGN_IN_LIMIT: '1000',
    ...extra,
  };
}

/** Config for an in-process app against a test database. */
export function testConfig(dbName: string, extra: Record<string, string> = {}): Config {
  return loadConfig({ ...testEnv(dbName, extra) } as NodeJS.ProcessEnv);
}
