import { Column, CreateDateColumn, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn } from 'typeorm';
import { Cultivar } from './cultivar.entity';

/** A misspelling or mishearing that maps to a cultivar record's accepted name. */
@Entity('cultivar_variants')
@Index('uq_variant_per_cultivar', ['cultivarId', 'normalized'], { unique: true })
export class CultivarVariant {
  @PrimaryGeneratedColumn({ type: 'int', unsigned: true })
  id: number;

  @Column({ name: 'cultivar_id', type: 'int', unsigned: true })
  cultivarId: number;

  @ManyToOne(() => Cultivar, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'cultivar_id' })
  cultivar?: Cultivar;

  @Column({ type: 'varchar', length: 120 })
  text: string;

  /** Lower-case, accents and punctuation folded: what lookups compare. */
  @Index('ix_variant_normalized')
  @Column({ type: 'varchar', length: 120 })
  normalized: string;

  @CreateDateColumn({ name: 'created_at', type: 'datetime', precision: 3, default: () => 'CURRENT_TIMESTAMP(3)' })
  createdAt: Date;
}
