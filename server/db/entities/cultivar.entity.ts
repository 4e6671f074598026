import { Column, CreateDateColumn, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn, UpdateDateColumn } from 'typeorm';
import type { TraitProfile } from '../../../shared/traits';
import { User } from './user.entity';

export const CULTIVAR_STATUSES = ['proposed', 'approved', 'retired'] as const;
export type CultivarStatus = (typeof CULTIVAR_STATUSES)[number];

/** One named plant: botanical name parts, Group, epithet, traits and teaching notes. */
@Entity('cultivars')
@Index('ix_cultivars_status_name', ['status', 'acceptedName'])
export class Cultivar {
  @PrimaryGeneratedColumn({ type: 'int', unsigned: true })
  id: number;

  @Index('uq_cultivars_slug', { unique: true })
  @Column({ type: 'varchar', length: 160 })
  slug: string;

  @Column({ type: 'varchar', length: 60 })
  genus: string;

  @Column({ type: 'varchar', length: 60, nullable: true })
  species: string | null;

  @Column({ name: 'infraspecific_rank', type: 'varchar', length: 12, nullable: true })
  infraspecificRank: string | null;

  @Column({ name: 'infraspecific_epithet', type: 'varchar', length: 60, nullable: true })
  infraspecificEpithet: string | null;

  /** Cultivar Group name, ending in "Group" (ICNCP Art. 3). */
  @Column({ name: 'group_name', type: 'varchar', length: 80, nullable: true })
  groupName: string | null;

  /** The cultivar epithet without quotes. */
  @Column({ type: 'varchar', length: 80 })
  epithet: string;

  /** The formatted accepted name, kept for sorting and searching. */
  @Column({ name: 'accepted_name', type: 'varchar', length: 255 })
  acceptedName: string;

  @Column({ type: 'enum', enum: CULTIVAR_STATUSES, default: 'approved' })
  status: CultivarStatus;

  /** Set when a moderator merged this duplicate into another record. */
  @Column({ name: 'merged_into_id', type: 'int', unsigned: true, nullable: true })
  mergedIntoId: number | null;

  @Column({ type: 'json', nullable: true })
  traits: TraitProfile | null;

  @Column({ name: 'notes_html', type: 'mediumtext' })
  notesHtml: string;

  /** Moderator-written pronunciation guide; when empty the Hepburn respelling is shown. */
  @Column({ type: 'varchar', length: 200, nullable: true })
  pronunciation: string | null;

  /** Origin or meaning of the name. */
  @Column({ type: 'text', nullable: true })
  meaning: string | null;

  /** Invented for the demo; shown as such wherever the record appears. */
  @Column({ type: 'boolean', default: false })
  fictional: boolean;

  @Column({ name: 'created_by', type: 'int', unsigned: true, nullable: true })
  createdById: number | null;

  @ManyToOne(() => User, { onDelete: 'SET NULL' })
  @JoinColumn({ name: 'created_by' })
  createdBy?: User | null;

  @CreateDateColumn({ name: 'created_at', type: 'datetime', precision: 3, default: () => 'CURRENT_TIMESTAMP(3)' })
  createdAt: Date;

  @UpdateDateColumn({ name: 'updated_at', type: 'datetime', precision: 3, default: () => 'CURRENT_TIMESTAMP(3)', onUpdate: 'CURRENT_TIMESTAMP(3)' })
  updatedAt: Date;
}
