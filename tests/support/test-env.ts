import net from 'node:net';
import path from 'node:path';
import { loadConfig, ROOT, type Config } from '../../server/config';

/** Where the tests' own MariaDB lives: apart from the developer's data, on its own port. */
export const TEST_DATA_DIR = path.join(ROOT, '.data', 'test');
/** Preferred port of the tests' MariaDB; the global setup may move to a free one and says so here. */
export const TEST_DB_PORT_PREFERRED = 3408;
export const testDbPort = () => Number(process.env.GROVEWALK_TEST_DB_PORT ?? TEST_DB_PORT_PREFERRED);
/** One id per test run, so two runs on one machine never share (or drop) each other's databases. */
process.env.GROVEWALK_TEST_RUN ??= String(process.pid);
const RUN = process.env.GROVEWALK_TEST_RUN;
export const INT_DB = `grovewalk_test_int_${RUN}`;
export const E2E_DB = `grovewalk_test_e2e_${RUN}`;

/** A port that is free right now on 127.0.0.1 (the system picks it). */
export function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const srv = net.createServer();
    srv.once('error', reject);
    srv.listen(0, '127.0.0.1', () => {
      const port = (srv.address() as net.AddressInfo).port;
      srv.close(() => resolve(port));
    });
  });
}

/** The environment the tests' servers run with (integration in-process, e2e as a child). */
export function testEnv(dbName: string, extra: Record<string, string> = {}): Record<string, string> {
  return {
    NODE_ENV: 'test',
    DATA_DIR: TEST_DATA_DIR,
    MEDIA_DIR: path.join(TEST_DATA_DIR, `media-${dbName}`),
    DB_PORT: String(testDbPort()),
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
