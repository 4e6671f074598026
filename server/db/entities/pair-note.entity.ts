import { Column, Entity, Index, PrimaryGeneratedColumn, UpdateDateColumn } from 'typeorm';

/** "How to tell them apart" for a pair of look-alike records; the pair is stored lower id first. */
@Entity('pair_notes')
@Index('uq_pair_notes_pair', ['cultivarAId', 'cultivarBId'], { unique: true })
export class PairNote {
  @PrimaryGeneratedColumn({ type: 'int', unsigned: true })
  id: number;

  @Column({ name: 'cultivar_a_id', type: 'int', unsigned: true })
  cultivarAId: number;

  @Column({ name: 'cultivar_b_id', type: 'int', unsigned: true })
  cultivarBId: number;

  /** Sanitised rich text. */
  @Column({ name: 'notes_html', type: 'mediumtext' })
  notesHtml: string;

  @Column({ name: 'updated_by', type: 'int', unsigned: true, nullable: true })
  updatedById: number | null;

  @UpdateDateColumn({ name: 'updated_at', type: 'datetime', precision: 3, default: () => 'CURRENT_TIMESTAMP(3)', onUpdate: 'CURRENT_TIMESTAMP(3)' })
  updatedAt: Date;
}
