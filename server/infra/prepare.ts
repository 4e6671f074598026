import path from 'node:path';
import type { DataSource } from 'typeorm';
import type { Config } from '../config';
import { createDataSource } from '../db/data-source';
import { ensureDatabase, startMariaDb, type MariaDbInstance } from './mariadb';

/** What a started environment holds; `close` undoes what this process started. */
export interface PreparedDb {
  dataSource: DataSource;
  mariadb: MariaDbInstance | null;
  close(): Promise<void>;
}

/**
 * Starts (or reuses) the app's own MariaDB, creates the database and user, connects and runs
 * pending migrations. With `fresh` the database is dropped first (tests).
 */
export async function prepareDatabase(config: Config, opts: { fresh?: boolean; migrate?: boolean; instanceDir?: string } = {}): Promise<PreparedDb> {
  let mariadb: MariaDbInstance | null = null;
  if (config.DB_MANAGED) {
    mariadb = await startMariaDb(opts.instanceDir ?? path.join(config.dataDir, 'mariadb'), config.DB_PORT);
    await ensureDatabase(mariadb, { name: config.DB_NAME, user: config.DB_USER, password: config.dbPassword }, opts.fresh);
  }
  const dataSource = createDataSource(config);
  await dataSource.initialize();
  if (opts.migrate !== false) await dataSource.runMigrations({ transaction: 'each' });
  return {
    dataSource,
    mariadb,
    async close() {
      if (dataSource.isInitialized) await dataSource.destroy();
    },
  };
}
