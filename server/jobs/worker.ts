import 'reflect-metadata';
import { ConfigError, loadConfig } from '../config';
import { createDataSource } from '../db/data-source';
import { InfraError } from '../infra/mariadb';
import { prepareDatabase } from '../infra/prepare';
import { MediaStorage } from '../media/storage';
import { jobHandlers } from './handlers';
import { JobRunner } from './runner';
import { removeOrphanOutputs } from './transcode.job';

/**
 * `npm run worker`: a transcoding worker on its own. With DB_MANAGED=true (one machine) it starts
 * or reuses the app's MariaDB; on another machine set DB_MANAGED=false and point DB_HOST at the
 * shared server. Any number of workers may run against one database.
 */
async function main() {
  const config = loadConfig();
  const db = config.DB_MANAGED ? await prepareDatabase(config) : null;
  const dataSource = db?.dataSource ?? createDataSource(config);
  if (!dataSource.isInitialized) await dataSource.initialize();
  const storage = new MediaStorage(config.mediaDir);
  await storage.ensure();
  const removed = await removeOrphanOutputs(dataSource, storage);
  if (removed) console.log(`removed ${removed} unfinished output folder(s)`);
  const runner = new JobRunner(dataSource, jobHandlers(dataSource, storage), { concurrency: config.WORKER_CONCURRENCY, staleAfterMs: config.JOB_STALE_MS });
  runner.start();
  console.log(`worker ${runner.workerId} waiting for jobs`);
  let stopping = false;
  for (const sig of ['SIGINT', 'SIGTERM'] as const) {
    process.on(sig, () => {
      if (stopping) return;
      stopping = true;
      void runner
        .stop()
        .then(() => dataSource.destroy())
        .finally(() => process.exit(0));
    });
  }
}

main().catch((err) => {
  console.error(err instanceof ConfigError || err instanceof InfraError ? err.message : err);
  process.exit(1);
});
