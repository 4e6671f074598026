import { Column, Entity, PrimaryGeneratedColumn } from 'typeorm';

/** The garden club this site serves; the seeded one is fictional and flagged so. */
@Entity('clubs')
export class Club {
  @PrimaryGeneratedColumn({ type: 'int', unsigned: true })
  id: number;

  @Column({ type: 'varchar', length: 120 })
  name: string;

  @Column({ type: 'text' })
  blurb: string;

  @Column({ type: 'boolean', default: false })
  fictional: boolean;
}
