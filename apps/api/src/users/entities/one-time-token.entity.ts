import { Column, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn } from 'typeorm';
import { CreatedAt, instantColumn } from '../../database/columns';
import { User } from './user.entity';

export const oneTimeTokenPurposes = ['invitation', 'password_reset'] as const;
export type OneTimeTokenPurpose = (typeof oneTimeTokenPurposes)[number];

/** A link sent by e-mail that works once: an invitation or a password reset. */
@Entity('one_time_tokens')
@Index('IDX_one_time_tokens_user_purpose', ['userId', 'purpose'])
export class OneTimeToken {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  @Column({ name: 'user_id', type: 'uuid' })
  userId: string;

  @ManyToOne(() => User, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'user_id' })
  user: User;

  @Column({ type: 'enum', enum: oneTimeTokenPurposes })
  purpose: OneTimeTokenPurpose;

  @Index('UQ_one_time_tokens_hash', { unique: true })
  @Column({ name: 'token_hash', type: 'char', length: 64 })
  tokenHash: string;

  @Column(instantColumn({ name: 'expires_at' }))
  expiresAt: Date;

  @Column(instantColumn({ name: 'used_at', nullable: true }))
  usedAt: Date | null;

  @CreatedAt()
  createdAt: Date;
}
