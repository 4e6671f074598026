import { Column, CreateDateColumn, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn } from 'typeorm';
import { SpellingFix } from './spelling-fix.entity';

/**
 * The audit of an accepted spelling fix: one row per rewritten cue with its text before and after,
 * so an undo restores exactly what was there and can tell whether someone edited the cue since.
 * Cue and track ids carry no foreign key: the audit outlives a track save that replaces its cues.
 */
@Entity('spelling_fix_changes')
@Index('ix_spelling_fix_changes_fix', ['fixId', 'cueId'])
export class SpellingFixChange {
  @PrimaryGeneratedColumn({ type: 'int', unsigned: true })
  id: number;

  @Column({ name: 'fix_id', type: 'int', unsigned: true })
  fixId: number;

  @ManyToOne(() => SpellingFix, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'fix_id' })
  fix?: SpellingFix;

  @Column({ name: 'cue_id', type: 'int', unsigned: true })
  cueId: number;

  @Index('ix_spelling_fix_changes_track')
  @Column({ name: 'track_id', type: 'int', unsigned: true })
  trackId: number;

  /** Cue timing at the time of the fix: shown in the audit, and finds the cue again after a re-save. */
  @Column({ name: 'start_ms', type: 'int', unsigned: true })
  startMs: number;

  @Column({ name: 'end_ms', type: 'int', unsigned: true })
  endMs: number;

  @Column({ name: 'before_text', type: 'text' })
  beforeText: string;

  @Column({ name: 'after_text', type: 'text' })
  afterText: string;

  @CreateDateColumn({ name: 'created_at', type: 'datetime', precision: 3, default: () => 'CURRENT_TIMESTAMP(3)' })
  createdAt: Date;
}
