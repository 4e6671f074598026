import { Column, CreateDateColumn, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn } from 'typeorm';
import { Cultivar } from './cultivar.entity';

/**
 * A photo of a cultivar record, stored resized (at most 1600 px on the long side) with a 400 px
 * thumbnail; paths are relative to MEDIA_DIR and never leave the server.
 */
@Entity('cultivar_photos')
@Index('ix_cultivar_photos_position', ['cultivarId', 'position'])
export class CultivarPhoto {
  @PrimaryGeneratedColumn({ type: 'int', unsigned: true })
  id: number;

  @Column({ name: 'cultivar_id', type: 'int', unsigned: true })
  cultivarId: number;

  @ManyToOne(() => Cultivar, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'cultivar_id' })
  cultivar?: Cultivar;

  /** The display image, relative to MEDIA_DIR (cultivars/<id>/<name>.jpg). */
  @Column({ type: 'varchar', length: 200 })
  file: string;

  @Column({ name: 'thumb_file', type: 'varchar', length: 200 })
  thumbFile: string;

  @Column({ type: 'smallint', unsigned: true })
  width: number;

  @Column({ type: 'smallint', unsigned: true })
  height: number;

  @Column({ name: 'thumb_width', type: 'smallint', unsigned: true })
  thumbWidth: number;

  @Column({ name: 'thumb_height', type: 'smallint', unsigned: true })
  thumbHeight: number;

  /** Required: what the photo shows, for people who cannot see it. */
  @Column({ name: 'alt_text', type: 'varchar', length: 300 })
  altText: string;

  @Column({ type: 'int', unsigned: true, default: 0 })
  position: number;

  @CreateDateColumn({ name: 'created_at', type: 'datetime', precision: 3, default: () => 'CURRENT_TIMESTAMP(3)' })
  createdAt: Date;
}
