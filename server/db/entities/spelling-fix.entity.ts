import { Column, CreateDateColumn, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn } from 'typeorm';
import { CaptionTrack } from './caption-track.entity';
import { Cultivar } from './cultivar.entity';
import { User } from './user.entity';

export const SPELLING_FIX_STATUSES = ['open', 'accepted', 'declined', 'undone'] as const;
export type SpellingFixStatus = (typeof SPELLING_FIX_STATUSES)[number];

export const SPELLING_FIX_SOURCES = ['viewer', 'detection'] as const;
export type SpellingFixSource = (typeof SPELLING_FIX_SOURCES)[number];

/**
 * A proposed correction of a name in captions: the text captions say, the record it should name,
 * who proposed it (a viewer, or detection), and the moderator's decision.
 */
@Entity('spelling_fixes')
// `open_guard` is 1 while the fix is open and NULL afterwards; NULLs never clash in a unique index,
// so this allows one open fix per (cultivar, normalized text) and any number of closed ones.
@Index('uq_spelling_fix_open', ['cultivarId', 'proposedNormalized', 'openGuard'], { unique: true })
@Index('ix_spelling_fix_status_created', ['status', 'createdAt'])
export class SpellingFix {
  @PrimaryGeneratedColumn({ type: 'int', unsigned: true })
  id: number;

  /** What the captions say, as flagged. */
  @Column({ name: 'proposed_text', type: 'varchar', length: 120 })
  proposedText: string;

  /** normalizeName(proposedText): what duplicates are recognised by. */
  @Column({ name: 'proposed_normalized', type: 'varchar', length: 120 })
  proposedNormalized: string;

  @Column({ name: 'cultivar_id', type: 'int', unsigned: true })
  cultivarId: number;

  @ManyToOne(() => Cultivar, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'cultivar_id' })
  cultivar?: Cultivar;

  /** The accepted epithet to write, copied when the fix was proposed. */
  @Column({ type: 'varchar', length: 80 })
  suggestion: string;

  @Column({ type: 'enum', enum: SPELLING_FIX_SOURCES })
  source: SpellingFixSource;

  /** Null for fixes proposed by detection. */
  @Column({ name: 'proposer_id', type: 'int', unsigned: true, nullable: true })
  proposerId: number | null;

  @ManyToOne(() => User, { onDelete: 'SET NULL' })
  @JoinColumn({ name: 'proposer_id' })
  proposer?: User | null;

  /** The cue where the text was flagged; cue ids change when a track is saved, so no foreign key. */
  @Column({ name: 'cue_id', type: 'int', unsigned: true, nullable: true })
  cueId: number | null;

  @Column({ name: 'track_id', type: 'int', unsigned: true, nullable: true })
  trackId: number | null;

  @ManyToOne(() => CaptionTrack, { onDelete: 'SET NULL' })
  @JoinColumn({ name: 'track_id' })
  track?: CaptionTrack | null;

  @Column({ type: 'enum', enum: SPELLING_FIX_STATUSES, default: 'open' })
  status: SpellingFixStatus;

  /** 1 while open, NULL otherwise (see the unique index). */
  @Column({ name: 'open_guard', type: 'tinyint', unsigned: true, nullable: true, default: 1 })
  openGuard: number | null;

  @Column({ name: 'decline_reason', type: 'varchar', length: 500, nullable: true })
  declineReason: string | null;

  /** The variant the accept added to the record, so undo removes only what the accept added. */
  @Column({ name: 'added_variant_id', type: 'int', unsigned: true, nullable: true })
  addedVariantId: number | null;

  @Column({ name: 'decided_by', type: 'int', unsigned: true, nullable: true })
  decidedById: number | null;

  @ManyToOne(() => User, { onDelete: 'SET NULL' })
  @JoinColumn({ name: 'decided_by' })
  decidedBy?: User | null;

  @Column({ name: 'decided_at', type: 'datetime', precision: 3, nullable: true })
  decidedAt: Date | null;

  @Column({ name: 'undone_by', type: 'int', unsigned: true, nullable: true })
  undoneById: number | null;

  @ManyToOne(() => User, { onDelete: 'SET NULL' })
  @JoinColumn({ name: 'undone_by' })
  undoneBy?: User | null;

  @Column({ name: 'undone_at', type: 'datetime', precision: 3, nullable: true })
  undoneAt: Date | null;

  @CreateDateColumn({ name: 'created_at', type: 'datetime', precision: 3, default: () => 'CURRENT_TIMESTAMP(3)' })
  createdAt: Date;
}
