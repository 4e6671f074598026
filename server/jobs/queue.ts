import type { DataSource, EntityManager } from 'typeorm';
import type { QueryDeepPartialEntity } from 'typeorm';
import { Job } from '../db/entities/job.entity';

/** How long a running job may go without a heartbeat before another worker takes it over. */
export const STALE_AFTER_MS = 30_000;

/** Retry delay after the n-th failed attempt: 5 s, 20 s, 80 s… capped at 10 minutes. */
export function backoffMs(attempt: number): number {
  return Math.min(600_000, 5000 * 4 ** Math.max(0, attempt - 1));
}

export interface EnqueueOptions {
  kind: string;
  subjectType: string;
  subjectId: number;
  payload?: Record<string, unknown>;
  maxAttempts?: number;
}

/** The persistent job queue: a MariaDB table claimed with SELECT … FOR UPDATE SKIP LOCKED. */
export class JobQueue {
  constructor(private readonly dataSource: DataSource, private readonly staleAfterMs = STALE_AFTER_MS) {}

  /** Adds a job; pass the caller's transaction manager so the job exists only if the change commits. */
  async enqueue(opts: EnqueueOptions, manager: EntityManager = this.dataSource.manager): Promise<Job> {
    const repo = manager.getRepository(Job);
    return repo.save(
      repo.create({
        kind: opts.kind,
        subjectType: opts.subjectType,
        subjectId: opts.subjectId,
        payload: opts.payload ?? {},
        maxAttempts: opts.maxAttempts ?? 3,
        runAfter: new Date(),
      }),
    );
  }

  /**
   * Takes the oldest runnable job (queued and due, or running with a stale heartbeat) for this
   * worker. Several workers on one database never take the same job: the row lock is skipped.
   */
  async claim(workerId: string, kinds: string[]): Promise<Job | null> {
    return this.dataSource.transaction(async (m) => {
      const now = new Date();
      const stale = new Date(now.getTime() - this.staleAfterMs);
      const job = await m
        .getRepository(Job)
        .createQueryBuilder('j')
        .where('j.kind IN (:...kinds)', { kinds })
        .andWhere("((j.state = 'queued' AND j.run_after <= :now) OR (j.state = 'running' AND j.heartbeat_at < :stale))", { now, stale })
        .orderBy('j.id', 'ASC')
        .limit(1)
        .setLock('pessimistic_write')
        .setOnLocked('skip_locked')
        .getOne();
      if (!job) return null;
      job.state = 'running';
      job.attempts += 1;
      job.leaseHolder = workerId;
      job.heartbeatAt = now;
      job.error = job.attempts > 1 ? job.error : null;
      job.progress = 0;
      job.etaSeconds = null;
      await m.getRepository(Job).update(
        { id: job.id },
        { state: 'running', attempts: job.attempts, leaseHolder: workerId, heartbeatAt: now, progress: 0, etaSeconds: null },
      );
      return job;
    });
  }

  /** Records progress and proves the worker is alive; false when the lease was lost to another worker. */
  async heartbeat(job: Job, workerId: string, progress?: number, etaSeconds?: number | null): Promise<boolean> {
    const patch: QueryDeepPartialEntity<Job> = { heartbeatAt: new Date() };
    if (progress !== undefined) patch.progress = Math.max(0, Math.min(100, progress));
    if (etaSeconds !== undefined) patch.etaSeconds = etaSeconds == null ? null : Math.max(0, Math.round(etaSeconds));
    const r = await this.dataSource.getRepository(Job).update({ id: job.id, leaseHolder: workerId, state: 'running' }, patch);
    return (r.affected ?? 0) > 0;
  }

  async complete(job: Job, workerId: string, manager: EntityManager = this.dataSource.manager): Promise<boolean> {
    const r = await manager
      .getRepository(Job)
      .update({ id: job.id, leaseHolder: workerId, state: 'running' }, { state: 'done', progress: 100, etaSeconds: 0, finishedAt: new Date() });
    return (r.affected ?? 0) > 0;
  }

  /** Schedules a retry with backoff, or marks the job failed for good; returns which. */
  async fail(job: Job, workerId: string, error: string): Promise<'retry' | 'failed' | 'lost'> {
    const final = job.attempts >= job.maxAttempts;
    const r = await this.dataSource.getRepository(Job).update(
      { id: job.id, leaseHolder: workerId, state: 'running' },
      final
        ? { state: 'failed', error: error.slice(0, 4000), finishedAt: new Date() }
        : { state: 'queued', error: error.slice(0, 4000), runAfter: new Date(Date.now() + backoffMs(job.attempts)), leaseHolder: null },
    );
    if ((r.affected ?? 0) === 0) return 'lost';
    return final ? 'failed' : 'retry';
  }

  /** Gives a job back without counting the attempt (the worker is shutting down cleanly). */
  async release(job: Job, workerId: string): Promise<void> {
    await this.dataSource
      .getRepository(Job)
      .update({ id: job.id, leaseHolder: workerId, state: 'running' }, { state: 'queued', attempts: Math.max(0, job.attempts - 1), leaseHolder: null, heartbeatAt: null, runAfter: new Date() });
  }

  /** Cancels queued or running jobs of a subject (e.g. the tour was deleted or re-uploaded). */
  async cancelFor(subjectType: string, subjectId: number, manager: EntityManager = this.dataSource.manager): Promise<void> {
    await manager
      .getRepository(Job)
      .createQueryBuilder()
      .update()
      .set({ state: 'cancelled', finishedAt: new Date() })
      .where('subject_type = :t AND subject_id = :id AND state IN (:...s)', { t: subjectType, id: subjectId, s: ['queued', 'running'] })
      .execute();
  }

  /** The newest job of a subject, for showing progress. */
  latestFor(subjectType: string, subjectId: number): Promise<Job | null> {
    return this.dataSource.getRepository(Job).findOne({ where: { subjectType, subjectId }, order: { id: 'DESC' } });
  }
}
