import { Column, CreateDateColumn, Entity, Index, PrimaryGeneratedColumn, UpdateDateColumn } from 'typeorm';
import { ROLES, type Role } from '../../../shared/schemas/common';

/** A person with an account; `role` decides what the server lets them do. */
@Entity('users')
export class User {
  @PrimaryGeneratedColumn({ type: 'int', unsigned: true })
  id: number;

  @Index('uq_users_email', { unique: true })
  @Column({ type: 'varchar', length: 254 })
  email: string;

  @Column({ name: 'display_name', type: 'varchar', length: 60 })
  displayName: string;

  @Column({ name: 'password_hash', type: 'varchar', length: 100 })
  passwordHash: string;

  @Column({ type: 'enum', enum: ROLES, default: 'viewer' })
  role: Role;

  @Column({ name: 'email_verified_at', type: 'datetime', precision: 3, nullable: true })
  emailVerifiedAt: Date | null;

  @Column({ name: 'disabled_at', type: 'datetime', precision: 3, nullable: true })
  disabledAt: Date | null;

  @Column({ name: 'unit_system', type: 'enum', enum: ['metric', 'imperial'], default: 'metric' })
  unitSystem: 'metric' | 'imperial';

  /** The reader's USDA hardiness zone (1a–13b), for "does it fit my garden" hints. */
  @Column({ name: 'hardiness_zone', type: 'varchar', length: 3, nullable: true })
  hardinessZone: string | null;

  /** Free text: the member's garden, shown on the club page. */
  @Column({ type: 'varchar', length: 120, nullable: true })
  garden: string | null;

  /** Bumped on password change so other sessions of this user stop working. */
  @Column({ name: 'session_epoch', type: 'int', unsigned: true, default: 0 })
  sessionEpoch: number;

  @CreateDateColumn({ name: 'created_at', type: 'datetime', precision: 3, default: () => 'CURRENT_TIMESTAMP(3)' })
  createdAt: Date;

  @UpdateDateColumn({ name: 'updated_at', type: 'datetime', precision: 3, default: () => 'CURRENT_TIMESTAMP(3)', onUpdate: 'CURRENT_TIMESTAMP(3)' })
  updatedAt: Date;
}
