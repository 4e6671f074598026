import { hostname } from 'node:os';
import { randomBytes } from 'node:crypto';
import type { DataSource } from 'typeorm';
import type { Job } from '../db/entities/job.entity';
import { JobQueue } from './queue';
export { STALE_AFTER_MS } from './queue';

/** What a job handler gets: progress reporting that doubles as the heartbeat, and a cancel signal. */
export interface JobContext {
  job: Job;
  workerId: string;
  signal: AbortSignal;
  progress(percent: number, etaSeconds?: number | null): Promise<void>;
}

export type JobHandler = {
  run(ctx: JobContext): Promise<void>;
  /** Called once the job has failed for good (after the last retry). */
  onFinalFailure?(job: Job, error: string): Promise<void>;
  /** Called when a retry is scheduled. */
  onRetry?(job: Job, error: string): Promise<void>;
};

/** Raised by a handler when retrying cannot help (e.g. the subject no longer exists). */
export class PermanentJobError extends Error {}

/** Raised when another worker took the job over (our heartbeat was too late). */
class LeaseLost extends Error {}

export interface RunnerOptions {
  pollMs?: number;
  heartbeatMs?: number;
  concurrency?: number;
  /** Heartbeat age after which a running job counts as abandoned (default STALE_AFTER_MS). */
  staleAfterMs?: number;
  /** A fixed worker id (tests); by default host:pid:random. */
  workerId?: string;
  log?: (msg: string) => void;
}

/** A worker: polls the queue, runs handlers, heartbeats while they run, retries with backoff. */
export class JobRunner {
  readonly workerId: string;
  private readonly queue: JobQueue;
  private stopped = false;
  private readonly running = new Map<number, { ctrl: AbortController; done: Promise<void>; job: Job }>();
  private loopPromise: Promise<void> | null = null;
  private wake: (() => void) | null = null;

  constructor(
    dataSource: DataSource,
    private readonly handlers: Record<string, JobHandler>,
    private readonly opts: RunnerOptions = {},
  ) {
    this.queue = new JobQueue(dataSource, opts.staleAfterMs);
    this.workerId = opts.workerId ?? `${hostname()}:${process.pid}:${randomBytes(3).toString('hex')}`;
  }

  start(): void {
    this.loopPromise ??= this.loop();
  }

  /** Asks the loop to look for work now instead of at the next poll. */
  poke(): void {
    this.wake?.();
  }

  private log(msg: string) {
    (this.opts.log ?? console.log)(`[worker ${this.workerId}] ${msg}`);
  }

  private async loop() {
    const concurrency = this.opts.concurrency ?? 1;
    while (!this.stopped) {
      let claimed: Job | null = null;
      if (this.running.size < concurrency) {
        try {
          claimed = await this.queue.claim(this.workerId, Object.keys(this.handlers));
        } catch (err) {
          if (!this.stopped) this.log(`claim failed: ${(err as Error).message}`);
        }
      }
      if (claimed) {
        this.launch(claimed);
        continue;
      }
      await new Promise<void>((r) => {
        const t = setTimeout(r, this.opts.pollMs ?? 1000);
        this.wake = () => {
          clearTimeout(t);
          r();
        };
      });
      this.wake = null;
    }
  }

  private launch(job: Job) {
    const ctrl = new AbortController();
    const done = this.execute(job, ctrl).finally(() => {
      this.running.delete(job.id);
      this.poke();
    });
    this.running.set(job.id, { ctrl, done, job });
  }

  private async execute(job: Job, ctrl: AbortController) {
    const handler = this.handlers[job.kind];
    let lost = false;
    const beat = async (progress?: number, eta?: number | null) => {
      const ok = await this.queue.heartbeat(job, this.workerId, progress, eta);
      if (!ok && !lost) {
        lost = true;
        ctrl.abort(new LeaseLost('lease lost'));
      }
    };
    const timer = setInterval(() => void beat().catch(() => undefined), this.opts.heartbeatMs ?? 5000);
    let lastBeat = 0;
    const ctx: JobContext = {
      job,
      workerId: this.workerId,
      signal: ctrl.signal,
      progress: async (p, eta) => {
        // Throttle writes: at most about two a second.
        if (Date.now() - lastBeat < 500 && p < 100) return;
        lastBeat = Date.now();
        await beat(p, eta);
      },
    };
    this.log(`job ${job.id} (${job.kind}) attempt ${job.attempts}/${job.maxAttempts}`);
    try {
      await handler.run(ctx);
      if (ctrl.signal.aborted) throw ctrl.signal.reason ?? new Error('aborted');
      await this.queue.complete(job, this.workerId);
      this.log(`job ${job.id} done`);
    } catch (err) {
      if (this.stopped && ctrl.signal.aborted) {
        await this.queue.release(job, this.workerId).catch(() => undefined);
        this.log(`job ${job.id} released for another worker`);
        return;
      }
      if (lost || err instanceof LeaseLost) {
        this.log(`job ${job.id} was taken over by another worker`);
        return;
      }
      const message = err instanceof Error ? err.message : String(err);
      if (err instanceof PermanentJobError) job.attempts = job.maxAttempts;
      const outcome = await this.queue.fail(job, this.workerId, message);
      this.log(`job ${job.id} ${outcome}: ${message.split('\n')[0]}`);
      if (outcome === 'failed') await handler.onFinalFailure?.(job, message).catch((e) => this.log(`onFinalFailure: ${e}`));
      if (outcome === 'retry') await handler.onRetry?.(job, message).catch((e) => this.log(`onRetry: ${e}`));
    } finally {
      clearInterval(timer);
    }
  }

  /** Stops taking work, aborts running jobs and hands them back to the queue. */
  async stop(): Promise<void> {
    this.stopped = true;
    this.poke();
    for (const r of this.running.values()) r.ctrl.abort(new Error('worker stopping'));
    await Promise.allSettled([...this.running.values()].map((r) => r.done));
    await this.loopPromise;
  }
}
