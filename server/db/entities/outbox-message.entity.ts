import { Column, Entity, Index, PrimaryGeneratedColumn } from 'typeorm';

/** A message caught by the local SMTP fake (development, demo and tests), readable by admins. */
@Entity('outbox_messages')
export class OutboxMessage {
  @PrimaryGeneratedColumn({ type: 'int', unsigned: true })
  id: number;

  @Index('ix_outbox_to')
  @Column({ name: 'to_address', type: 'varchar', length: 500 })
  to: string;

  @Column({ name: 'from_address', type: 'varchar', length: 500 })
  from: string;

  @Column({ type: 'varchar', length: 500 })
  subject: string;

  @Column({ type: 'mediumtext' })
  text: string;

  @Column({ type: 'mediumtext', nullable: true })
  html: string | null;

  @Column({ name: 'received_at', type: 'datetime', precision: 3 })
  receivedAt: Date;
}
