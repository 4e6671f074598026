import { Column, CreateDateColumn, Entity, Index, PrimaryGeneratedColumn, UpdateDateColumn } from 'typeorm';

export const JOB_STATES = ['queued', 'running', 'done', 'failed', 'cancelled'] as const;
export type JobState = (typeof JOB_STATES)[number];

/** A unit of background work in the persistent queue (MariaDB, claimed with SKIP LOCKED). */
@Entity('jobs')
@Index('ix_jobs_claim', ['state', 'runAfter'])
@Index('ix_jobs_subject', ['subjectType', 'subjectId'])
export class Job {
  @PrimaryGeneratedColumn({ type: 'int', unsigned: true })
  id: number;

  @Column({ type: 'varchar', length: 40 })
  kind: string;

  @Column({ name: 'subject_type', type: 'varchar', length: 40 })
  subjectType: string;

  @Column({ name: 'subject_id', type: 'int', unsigned: true })
  subjectId: number;

  @Column({ type: 'json' })
  payload: Record<string, unknown>;

  @Column({ type: 'enum', enum: JOB_STATES, default: 'queued' })
  state: JobState;

  @Column({ type: 'smallint', unsigned: true, default: 0 })
  attempts: number;

  @Column({ name: 'max_attempts', type: 'smallint', unsigned: true, default: 3 })
  maxAttempts: number;

  /** 0–100. */
  @Column({ type: 'float', default: 0 })
  progress: number;

  @Column({ name: 'eta_seconds', type: 'int', unsigned: true, nullable: true })
  etaSeconds: number | null;

  @Column({ type: 'text', nullable: true })
  error: string | null;

  @Column({ name: 'lease_holder', type: 'varchar', length: 120, nullable: true })
  leaseHolder: string | null;

  @Column({ name: 'heartbeat_at', type: 'datetime', precision: 3, nullable: true })
  heartbeatAt: Date | null;

  @Column({ name: 'run_after', type: 'datetime', precision: 3 })
  runAfter: Date;

  @Column({ name: 'finished_at', type: 'datetime', precision: 3, nullable: true })
  finishedAt: Date | null;

  @CreateDateColumn({ name: 'created_at', type: 'datetime', precision: 3, default: () => 'CURRENT_TIMESTAMP(3)' })
  createdAt: Date;

  @UpdateDateColumn({ name: 'updated_at', type: 'datetime', precision: 3, default: () => 'CURRENT_TIMESTAMP(3)', onUpdate: 'CURRENT_TIMESTAMP(3)' })
  updatedAt: Date;
}
