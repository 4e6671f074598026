import { Column, CreateDateColumn, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn, UpdateDateColumn } from 'typeorm';
import { TOUR_STATES, type TourState } from '../../../shared/schemas/tours';
import { User } from './user.entity';

/** One rendition of a tour's video as stored on disk (relative to the tour's media folder). */
export interface RenditionRecord {
  height: number;
  width: number;
  file: string;
  bytes: number;
  videoBitrate: number | null;
  copied: boolean;
}

/** Thumbnail sprite sheets for seeking previews: tile i shows time i × everySec. */
export interface ThumbStripRecord {
  everySec: number;
  tileWidth: number;
  tileHeight: number;
  columns: number;
  rows: number;
  count: number;
  sheets: { file: string; width: number; height: number }[];
}

/** A walk-through video with its details; the media fields are filled by the transcode job. */
@Entity('tours')
@Index('ix_tours_state_published', ['state', 'publishedAt'])
export class Tour {
  @PrimaryGeneratedColumn({ type: 'int', unsigned: true })
  id: number;

  @Column({ name: 'author_id', type: 'int', unsigned: true })
  authorId: number;

  @ManyToOne(() => User, { onDelete: 'RESTRICT' })
  @JoinColumn({ name: 'author_id' })
  author?: User;

  @Column({ type: 'varchar', length: 160 })
  title: string;

  /** Sanitised HTML from the rich-text editor. */
  @Column({ name: 'description_html', type: 'mediumtext' })
  descriptionHtml: string;

  @Column({ type: 'varchar', length: 160, default: '' })
  garden: string;

  @Column({ name: 'filmed_on', type: 'date', nullable: true })
  filmedOn: string | null;

  @Column({ type: 'enum', enum: TOUR_STATES, default: 'draft' })
  state: TourState;

  @Column({ name: 'published_at', type: 'datetime', precision: 3, nullable: true })
  publishedAt: Date | null;

  /** Original upload, relative to MEDIA_DIR; kept so the tour can be transcoded again. */
  @Column({ name: 'source_file', type: 'varchar', length: 300, nullable: true })
  sourceFile: string | null;

  @Column({ name: 'source_name', type: 'varchar', length: 255, nullable: true })
  sourceName: string | null;

  @Column({ name: 'source_bytes', type: 'bigint', unsigned: true, nullable: true, transformer: { to: (v) => v, from: (v) => (v == null ? null : Number(v)) } })
  sourceBytes: number | null;

  @Column({ name: 'duration_ms', type: 'int', unsigned: true, nullable: true })
  durationMs: number | null;

  @Column({ type: 'smallint', unsigned: true, nullable: true })
  width: number | null;

  @Column({ type: 'smallint', unsigned: true, nullable: true })
  height: number | null;

  @Column({ name: 'source_codecs', type: 'varchar', length: 120, nullable: true })
  sourceCodecs: string | null;

  /** Folder of the current outputs, relative to MEDIA_DIR (a new one per transcode). */
  @Column({ name: 'media_dir', type: 'varchar', length: 300, nullable: true })
  mediaDir: string | null;

  @Column({ type: 'json', nullable: true })
  renditions: RenditionRecord[] | null;

  @Column({ name: 'poster_file', type: 'varchar', length: 120, nullable: true })
  posterFile: string | null;

  @Column({ name: 'thumb_strip', type: 'json', nullable: true })
  thumbStrip: ThumbStripRecord | null;

  @Column({ name: 'failure_reason', type: 'text', nullable: true })
  failureReason: string | null;

  @CreateDateColumn({ name: 'created_at', type: 'datetime', precision: 3, default: () => 'CURRENT_TIMESTAMP(3)' })
  createdAt: Date;

  @UpdateDateColumn({ name: 'updated_at', type: 'datetime', precision: 3, default: () => 'CURRENT_TIMESTAMP(3)', onUpdate: 'CURRENT_TIMESTAMP(3)' })
  updatedAt: Date;
}
