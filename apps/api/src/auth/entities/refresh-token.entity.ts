import { Column, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn } from 'typeorm';
import { CreatedAt, instantColumn } from '../../database/columns';
import { User } from '../../users/entities/user.entity';

/**
 * One refresh token of a sign-in session. Every refresh replaces the token with a new
 * one of the same family; presenting a replaced token again (after a short grace for
 * two tabs refreshing at once) is taken as theft and revokes the whole family.
 */
@Entity('refresh_tokens')
@Index('IDX_refresh_tokens_family', ['familyId'])
export class RefreshToken {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  @Column({ name: 'user_id', type: 'uuid' })
  userId: string;

  @ManyToOne(() => User, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'user_id' })
  user: User;

  @Column({ name: 'family_id', type: 'uuid' })
  familyId: string;

  /** SHA-256 of the token, hex; the token itself is never stored. */
  @Index('UQ_refresh_tokens_hash', { unique: true })
  @Column({ name: 'token_hash', type: 'char', length: 64 })
  tokenHash: string;

  @Column(instantColumn({ name: 'expires_at' }))
  expiresAt: Date;

  /** When this token was exchanged for its successor. */
  @Column(instantColumn({ name: 'replaced_at', nullable: true }))
  replacedAt: Date | null;

  @Column(instantColumn({ name: 'revoked_at', nullable: true }))
  revokedAt: Date | null;

  @CreatedAt()
  createdAt: Date;
}
