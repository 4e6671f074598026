import { Column, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn, UpdateDateColumn } from 'typeorm';
import { Tour } from './tour.entity';

/** One language of captions for a tour; `version` guards against two editors overwriting each other. */
@Entity('caption_tracks')
@Index('uq_track_lang', ['tourId', 'lang'], { unique: true })
export class CaptionTrack {
  @PrimaryGeneratedColumn({ type: 'int', unsigned: true })
  id: number;

  @Column({ name: 'tour_id', type: 'int', unsigned: true })
  tourId: number;

  @ManyToOne(() => Tour, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'tour_id' })
  tour?: Tour;

  /** BCP 47 language tag, e.g. "en" or "en-GB". */
  @Column({ type: 'varchar', length: 35 })
  lang: string;

  @Column({ type: 'varchar', length: 80 })
  label: string;

  @Column({ type: 'int', unsigned: true, default: 1 })
  version: number;

  @Column({ name: 'updated_by', type: 'int', unsigned: true, nullable: true })
  updatedById: number | null;

  @UpdateDateColumn({ name: 'updated_at', type: 'datetime', precision: 3, default: () => 'CURRENT_TIMESTAMP(3)', onUpdate: 'CURRENT_TIMESTAMP(3)' })
  updatedAt: Date;
}
