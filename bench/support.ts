/**
 * What the database benchmarks share: their flags, the private MariaDB they run against (under
 * .data/bench, never the app's own) with a fresh migrated database, and the app in process.
 */
import 'reflect-metadata';
import path from 'node:path';
import type { DataSource } from 'typeorm';
import { createApp, type AppHandle } from '../server/app';
import { loadConfig, ROOT, type Config } from '../server/config';
import { stopMariaDb } from '../server/infra/mariadb';
import { prepareDatabase } from '../server/infra/prepare';

const argv = process.argv.slice(2);

/** The value after `--name` on the command line, if given. */
export function benchArg(name: string): string | undefined {
  const i = argv.indexOf(`--${name}`);
  return i >= 0 ? argv[i + 1] : undefined;
}

/** Nearest-rank percentile `p` of ascending values; NaN when there are none. */
export function percentile(sorted: readonly number[], p: number): number {
  if (!sorted.length) return NaN;
  return sorted[Math.min(sorted.length - 1, Math.max(0, Math.ceil((p / 100) * sorted.length) - 1))]!;
}

/** A started bench database; `close` stops what `startBench` started. */
export interface BenchEnv {
  config: Config;
  dataSource: DataSource;
  /** The whole app in this process, with a mailer and a log that stay silent. */
  createApp(): AppHandle;
  close(): Promise<void>;
}

/**
 * Starts the private MariaDB under .data/bench on port `--port`, BENCH_DB_PORT or 3409, and
 * creates a fresh `grovewalk_bench` database with every migration run.
 */
export async function startBench(): Promise<BenchEnv> {
  const dataDir = path.join(ROOT, '.data', 'bench');
  const config = loadConfig({
    ...process.env,
    NODE_ENV: 'test',
    DATA_DIR: dataDir,
    DB_PORT: benchArg('port') ?? process.env.BENCH_DB_PORT ?? '3409',
    DB_NAME: 'grovewalk_bench',
    DB_USER: 'grovewalk_bench',
    MEDIA_DIR: path.join(dataDir, 'media'),
    BCRYPT_COST: '4',
  });
  const db = await prepareDatabase(config, { fresh: true });
  return {
    config,
    dataSource: db.dataSource,
    createApp: () => createApp({ config, dataSource: db.dataSource, mailer: { send: async () => undefined, close: () => undefined }, log: () => undefined }),
    async close() {
      await db.close();
      if (db.mariadb) await stopMariaDb(db.mariadb);
    },
  };
}
