import 'reflect-metadata';
import http from 'node:http';
import { createApp } from './app';
import { ConfigError, loadConfig } from './config';
import { seedDemo } from './db/seed/seed';
import { DEMO_MEMBERS, DEMO_PASSWORD } from './db/seed/demo-accounts';
import { InfraError, portInUse, stopMariaDb } from './infra/mariadb';
import { prepareDatabase } from './infra/prepare';
import { startFakeSmtp } from './mail/fake-smtp';
import { createMailer } from './mail/mailer';
import { MediaStorage } from './media/storage';
import { jobHandlers } from './jobs/handlers';
import { JobRunner } from './jobs/runner';
import { removeOrphanOutputs } from './jobs/transcode.job';
import { seedDemoContent } from './db/seed/demo-content';
import { Cultivar } from './db/entities/cultivar.entity';
import { Tour } from './db/entities/tour.entity';

/** Starts everything `npm start` serves: MariaDB, migrations, demo seed, mail catcher, API and client. */
async function main() {
  const config = loadConfig();
  if (await portInUse(config.PORT, config.HOST)) {
    throw new InfraError(`Port ${config.PORT} on ${config.HOST} is taken by another program; set PORT to a free port.`);
  }
  const db = await prepareDatabase(config);
  const cleanups: (() => Promise<void> | void)[] = [];
  const shutdown = async (code: number) => {
    for (const fn of cleanups.reverse()) {
      try {
        await fn();
      } catch (err) {
        console.error('while stopping:', err);
      }
    }
    await db.close();
    if (db.mariadb) await stopMariaDb(db.mariadb);
    process.exit(code);
  };
  try {
    if (config.useFakeSmtp) {
      if (await portInUse(config.FAKE_SMTP_PORT)) throw new InfraError(`Port ${config.FAKE_SMTP_PORT} for the local mail catcher is taken; set FAKE_SMTP_PORT.`);
      const smtp = await startFakeSmtp(db.dataSource, config.FAKE_SMTP_PORT);
      cleanups.push(() => smtp.close());
    }
    const seeded = config.SEED_DEMO ? await seedDemo(db.dataSource, { bcryptCost: config.BCRYPT_COST }) : false;
    const mailer = createMailer(config.smtpUrl, config.MAIL_FROM, { ignoreTLS: config.useFakeSmtp });
    cleanups.push(() => mailer.close());
    const storage = new MediaStorage(config.mediaDir);
    await storage.ensure();
    // First run only: right after the club was seeded, or on a database from before demo content existed.
    const noContent = (await db.dataSource.getRepository(Cultivar).count()) === 0 && (await db.dataSource.getRepository(Tour).count()) === 0;
    if (config.SEED_DEMO && (seeded || noContent)) {
      const content = await seedDemoContent(db.dataSource, storage);
      if (content.tours) console.log(`Queued ${content.tours} demo walks (fictional) for transcoding; they publish themselves when ready.`);
    }
    let runner: JobRunner | null = null;
    if (config.WORKER) {
      await removeOrphanOutputs(db.dataSource, storage);
      runner = new JobRunner(db.dataSource, jobHandlers(db.dataSource, storage), { concurrency: config.WORKER_CONCURRENCY, staleAfterMs: config.JOB_STALE_MS });
      runner.start();
      const r = runner;
      cleanups.push(() => r.stop());
    }
    const handle = createApp({ config, dataSource: db.dataSource, mailer, serveClient: true, onJobEnqueued: () => runner?.poke() });
    cleanups.push(() => handle.close());
    const server = http.createServer(handle.app);
    await new Promise<void>((resolve, reject) => {
      server.once('error', reject);
      server.listen(config.PORT, config.HOST, () => resolve());
    });
    cleanups.push(() => new Promise<void>((r) => { server.close(() => r()); server.closeAllConnections(); }));

    console.log(`\nGrovewalk is running at ${config.publicUrl}/`);
    if (config.SEED_DEMO) {
      console.log(`${seeded ? 'Seeded' : 'Using'} the demo club (fictional). Demo accounts, password "${DEMO_PASSWORD}":`);
      for (const m of DEMO_MEMBERS) console.log(`  ${m.role.padEnd(9)} ${m.email}`);
    }
    if (config.useFakeSmtp) console.log(`E-mail goes to the local catcher: sign in as admin and open ${config.publicUrl}/admin/outbox`);
    console.log('Press Ctrl-C to stop.\n');
  } catch (err) {
    report(err);
    await shutdown(1);
  }
  let stopping = false;
  for (const sig of ['SIGINT', 'SIGTERM'] as const) {
    process.on(sig, () => {
      if (stopping) return;
      stopping = true;
      console.log('\nStopping Grovewalk…');
      void shutdown(0);
    });
  }
}

function report(err: unknown) {
  if (err instanceof ConfigError || err instanceof InfraError) console.error(err.message);
  else console.error(err);
}

main().catch((err) => {
  report(err);
  process.exit(1);
});
