import { Column, CreateDateColumn, Entity, Index, PrimaryGeneratedColumn } from 'typeorm';

/** One answer in learn mode: which stop's clip was shown, the right record and the one picked. */
@Entity('learn_attempts')
@Index('ix_learn_attempts_user', ['userId', 'createdAt'])
export class LearnAttempt {
  @PrimaryGeneratedColumn({ type: 'int', unsigned: true })
  id: number;

  @Column({ name: 'user_id', type: 'int', unsigned: true })
  userId: number;

  @Column({ name: 'stop_id', type: 'int', unsigned: true })
  stopId: number;

  @Column({ name: 'cultivar_id', type: 'int', unsigned: true })
  cultivarId: number;

  @Column({ name: 'chosen_id', type: 'int', unsigned: true })
  chosenId: number;

  @Column({ type: 'boolean' })
  correct: boolean;

  @CreateDateColumn({ name: 'created_at', type: 'datetime', precision: 3, default: () => 'CURRENT_TIMESTAMP(3)' })
  createdAt: Date;
}
