import { Column, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn } from 'typeorm';
import { CaptionTrack } from './caption-track.entity';

/** A WebVTT cue: timing in milliseconds, text, settings and the optional cue identifier. */
@Entity('cues')
@Index('ix_cues_track_start', ['trackId', 'startMs'])
@Index('ft_cues_text', ['text'], { fulltext: true })
export class CueRow {
  @PrimaryGeneratedColumn({ type: 'int', unsigned: true })
  id: number;

  @Column({ name: 'track_id', type: 'int', unsigned: true })
  trackId: number;

  @ManyToOne(() => CaptionTrack, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'track_id' })
  track?: CaptionTrack;

  /** Order within the track (cues are kept sorted by start, then end). */
  @Column({ type: 'int', unsigned: true })
  seq: number;

  @Column({ name: 'start_ms', type: 'int', unsigned: true })
  startMs: number;

  @Column({ name: 'end_ms', type: 'int', unsigned: true })
  endMs: number;

  @Column({ type: 'text' })
  text: string;

  @Column({ type: 'varchar', length: 255, default: '' })
  settings: string;

  /** The WebVTT cue identifier, if the author gave one. */
  @Column({ name: 'cue_ident', type: 'varchar', length: 255, nullable: true })
  cueIdent: string | null;
}
