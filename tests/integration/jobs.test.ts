import { spawn } from 'node:child_process';
import { existsSync, mkdtempSync, readdirSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { ROOT } from '../../server/config';
import { Job } from '../../server/db/entities/job.entity';
import { Tour } from '../../server/db/entities/tour.entity';
import { jobHandlers } from '../../server/jobs/handlers';
import { JobQueue } from '../../server/jobs/queue';
import { JobRunner, type JobHandler } from '../../server/jobs/runner';
import { MediaStorage } from '../../server/media/storage';
import { agentAs } from '../support/fixtures';
import { resetTables, startTestServer, type Agent, type TestServer } from '../support/http';
import { generateClip } from '../support/make-clip';
import { INT_DB, testEnv } from '../support/test-env';

let server: TestServer;
let author: Agent;
let storage: MediaStorage;
const tmp = mkdtempSync(path.join(os.tmpdir(), 'grovewalk-jobs-'));
const sleep = (ms: number) => new Promise((r) => setTimeout(r, ms));

async function until<T>(what: string, fn: () => Promise<T | null | undefined | false>, timeoutMs = 60_000): Promise<T> {
  const end = Date.now() + timeoutMs;
  for (;;) {
    const v = await fn();
    if (v) return v;
    if (Date.now() > end) throw new Error(`timed out waiting for ${what}`);
    await sleep(100);
  }
}

beforeAll(async () => {
  server = await startTestServer();
  await resetTables(server.dataSource);
  storage = new MediaStorage(server.config.mediaDir);
  await storage.ensure();
  author = (await agentAs(server, 'author')).agent;
});
afterAll(async () => server.close());

describe('job queue claims with SELECT … FOR UPDATE SKIP LOCKED', () => {
  it('never hands one job to two workers, even when they race', async () => {
    const q = new JobQueue(server.dataSource);
    for (let i = 0; i < 30; i++) await q.enqueue({ kind: 'noop-test', subjectType: 'test', subjectId: i + 1 });
    const claimedBy = new Map<number, string[]>();
    const worker = async (id: string) => {
      const queue = new JobQueue(server.dataSource);
      for (;;) {
        const job = await queue.claim(id, ['noop-test']);
        if (!job) return;
        claimedBy.set(job.id, [...(claimedBy.get(job.id) ?? []), id]);
        await queue.complete(job, id);
      }
    };
    await Promise.all(['w1', 'w2', 'w3', 'w4'].map(worker));
    expect(claimedBy.size).toBe(30);
    for (const holders of claimedBy.values()) expect(holders).toHaveLength(1);
    expect(await server.dataSource.getRepository(Job).countBy({ kind: 'noop-test', state: 'done' })).toBe(30);
  });

  it('retries with backoff, then fails for good and calls the final-failure hook', async () => {
    const q = new JobQueue(server.dataSource);
    const job = await q.enqueue({ kind: 'always-fails', subjectType: 'test', subjectId: 99, maxAttempts: 2 });
    const failures: string[] = [];
    const handler: JobHandler = {
      run: async () => {
        throw new Error('ffmpeg said: invalid data found when processing input');
      },
      onFinalFailure: async (_j, e) => void failures.push(e),
    };
    const runner = new JobRunner(server.dataSource, { 'always-fails': handler }, { pollMs: 50, log: () => undefined });
    runner.start();
    const afterFirst = await until('first failure', async () => {
      const j = await server.dataSource.getRepository(Job).findOneByOrFail({ id: job.id });
      return j.attempts === 1 && j.state === 'queued' ? j : null;
    });
    // Backoff: the retry is not due for about five seconds.
    expect(afterFirst.runAfter.getTime() - Date.now()).toBeGreaterThan(3000);
    await server.dataSource.getRepository(Job).update({ id: job.id }, { runAfter: new Date() });
    runner.poke();
    const final = await until('final failure', async () => {
      const j = await server.dataSource.getRepository(Job).findOneByOrFail({ id: job.id });
      return j.state === 'failed' ? j : null;
    });
    await runner.stop();
    expect(final.attempts).toBe(2);
    expect(final.error).toContain('invalid data');
    expect(failures).toHaveLength(1);
  });
});

describe('transcode workers', () => {
  it('a worker killed in the middle of a job: the job is taken again, finishes, and leaves no orphan files', async () => {
    const clip = await generateClip(path.join(tmp, 'long.mkv'), { seconds: 20, width: 1280, height: 720, audio: true, codec: 'mpeg4' });
    const up = await author.upload('/api/tours', clip, { title: 'Killed worker test' });
    expect(up.status).toBe(202);
    const tourId = up.body.tour.id as number;

    // tsx as a loader inside one process (not its CLI, which runs the script in a grandchild), so
    // the kill below really kills the worker.
    const env = { ...process.env, ...testEnv(INT_DB, { DB_MANAGED: 'false', JOB_STALE_MS: '1500' }), TSX_TSCONFIG_PATH: 'tsconfig.server.json' };
    const child = spawn(process.execPath, ['--import', 'tsx', 'server/jobs/worker.ts'], {
      cwd: ROOT,
      env,
      stdio: 'ignore',
    });
    try {
      await until('the child worker to make progress', async () => {
        const j = await server.dataSource.getRepository(Job).findOneBy({ subjectType: 'tour', subjectId: tourId });
        return j && j.state === 'running' && j.progress > 3 ? j : null;
      });
    } finally {
      child.kill('SIGKILL');
    }
    await new Promise((r) => (child.exitCode !== null ? r(null) : child.once('exit', r)));

    const runner = new JobRunner(server.dataSource, jobHandlers(server.dataSource, storage), { pollMs: 100, heartbeatMs: 300, staleAfterMs: 1500, log: () => undefined });
    runner.start();
    try {
      // The tour turns ready a moment before the job row is marked done: wait for the job.
      const job = await until('the job to finish', async () => {
        const j = await server.dataSource.getRepository(Job).findOneByOrFail({ subjectType: 'tour', subjectId: tourId });
        return j.state === 'done' || j.state === 'failed' ? j : null;
      }, 120_000);
      const tour = await server.dataSource.getRepository(Tour).findOneByOrFail({ id: tourId });
      expect(tour.state).toBe('ready');
      expect(job.state).toBe('done');
      expect(job.attempts).toBe(2);
      // One output folder, the current one, and no half-written files in it.
      const dirs = readdirSync(storage.tourRenditionsRoot(tourId));
      expect(dirs).toEqual([path.basename(tour.mediaDir!)]);
      const files = readdirSync(storage.resolve(tour.mediaDir!));
      expect(files.filter((f) => f.endsWith('.part'))).toEqual([]);
      for (const r of tour.renditions!) expect(existsSync(storage.resolve(`${tour.mediaDir}/${r.file}`))).toBe(true);
    } finally {
      await runner.stop();
    }
  }, 180_000);

  it('two workers on one queue: each tour transcoded exactly once', async () => {
    const clip = await generateClip(path.join(tmp, 'small.mp4'), { seconds: 2, width: 320, height: 180, audio: false, codec: 'mpeg4', container: 'mp4' });
    const ids: number[] = [];
    for (let i = 0; i < 4; i++) ids.push((await author.upload('/api/tours', clip, { title: `Queue test ${i}` })).body.tour.id);
    const runs: { jobId: number; worker: string }[] = [];
    const wrap = (worker: string) => {
      const base = jobHandlers(server.dataSource, storage);
      return Object.fromEntries(
        Object.entries(base).map(([k, h]) => [k, { ...h, run: async (ctx: Parameters<JobHandler['run']>[0]) => (runs.push({ jobId: ctx.job.id, worker }), h.run(ctx)) }]),
      );
    };
    const a = new JobRunner(server.dataSource, wrap('A'), { pollMs: 50, workerId: 'A', log: () => undefined });
    const b = new JobRunner(server.dataSource, wrap('B'), { pollMs: 50, workerId: 'B', log: () => undefined });
    a.start();
    b.start();
    try {
      await until('all four jobs', async () => {
        const done = await server.dataSource.getRepository(Job).findBy(ids.map((id) => ({ subjectType: 'tour', subjectId: id, state: 'done' as const })));
        return done.length === 4;
      }, 120_000);
    } finally {
      await Promise.all([a.stop(), b.stop()]);
    }
    const jobIds = runs.map((r) => r.jobId);
    expect(new Set(jobIds).size).toBe(jobIds.length);
    expect(jobIds).toHaveLength(4);
    const jobs = await server.dataSource.getRepository(Job).findBy(ids.map((id) => ({ subjectType: 'tour', subjectId: id })));
    expect(jobs.every((j) => j.state === 'done' && j.attempts === 1)).toBe(true);
  }, 180_000);
});
