import 'reflect-metadata';
import mysql from 'mysql2/promise';
import path from 'node:path';
import { ensureDatabase, startMariaDb, stopMariaDb, type MariaDbInstance } from '../../server/infra/mariadb';
import { createDataSource } from '../../server/db/data-source';
import { E2E_DB, INT_DB, TEST_DATA_DIR, TEST_DB_PORT_PREFERRED, testConfig } from './test-env';

// One MariaDB for the whole run, shared by the integration and e2e projects. Each project may load
// this file as a separate module instance, so the shared state lives on globalThis.
const g = globalThis as typeof globalThis & { __grovewalkTestDb?: { started: Promise<MariaDbInstance>; users: number } };

async function startOnce(): Promise<MariaDbInstance> {
  const inst = await startMariaDb(path.join(TEST_DATA_DIR, 'mariadb'), TEST_DB_PORT_PREFERRED, { searchPorts: true });
  // Test workers and the e2e server inherit this, so they all reach the same instance.
  process.env.GROVEWALK_TEST_DB_PORT = String(inst.port);
  for (const name of [INT_DB, E2E_DB]) {
    const config = testConfig(name);
    await ensureDatabase(inst, { name, user: config.DB_USER, password: config.dbPassword }, true);
    const ds = createDataSource(config);
    await ds.initialize();
    await ds.runMigrations({ transaction: 'each' });
    await ds.destroy();
  }
  return inst;
}

async function dropDatabases(inst: MariaDbInstance) {
  const conn = await mysql.createConnection({ socketPath: inst.socket, user: 'root' });
  try {
    for (const name of [INT_DB, E2E_DB]) await conn.query(`DROP DATABASE IF EXISTS \`${name}\``);
  } finally {
    await conn.end();
  }
}

/** Vitest global setup: a fresh test database per project kind, migrated; stopped at the end. */
export default async function setup() {
  g.__grovewalkTestDb ??= { started: startOnce(), users: 0 };
  const state = g.__grovewalkTestDb;
  const inst = await state.started;
  state.users++;
  return async () => {
    state.users--;
    if (state.users === 0) {
      await dropDatabases(inst).catch(() => undefined);
      await stopMariaDb(inst);
    }
  };
}
