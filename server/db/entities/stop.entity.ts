import { Column, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn, UpdateDateColumn } from 'typeorm';
import { Cultivar } from './cultivar.entity';
import { Tour } from './tour.entity';

/** A time range of a tour that shows one tree, linked to a cultivar record or left unidentified. */
@Entity('stops')
@Index('ix_stops_tour_start', ['tourId', 'startMs'])
export class Stop {
  @PrimaryGeneratedColumn({ type: 'int', unsigned: true })
  id: number;

  @Column({ name: 'tour_id', type: 'int', unsigned: true })
  tourId: number;

  @ManyToOne(() => Tour, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'tour_id' })
  tour?: Tour;

  @Column({ name: 'start_ms', type: 'int', unsigned: true })
  startMs: number;

  @Column({ name: 'end_ms', type: 'int', unsigned: true })
  endMs: number;

  @Column({ type: 'varchar', length: 160 })
  title: string;

  /** Null: an unidentified tree. */
  @Index('ix_stops_cultivar')
  @Column({ name: 'cultivar_id', type: 'int', unsigned: true, nullable: true })
  cultivarId: number | null;

  @ManyToOne(() => Cultivar, { onDelete: 'RESTRICT', nullable: true })
  @JoinColumn({ name: 'cultivar_id' })
  cultivar?: Cultivar | null;

  @UpdateDateColumn({ name: 'updated_at', type: 'datetime', precision: 3, default: () => 'CURRENT_TIMESTAMP(3)', onUpdate: 'CURRENT_TIMESTAMP(3)' })
  updatedAt: Date;
}
