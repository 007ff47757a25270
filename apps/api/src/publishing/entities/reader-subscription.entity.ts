import { Column, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn } from 'typeorm';
import type { Relation } from 'typeorm';
import { Claim } from '../../claims/entities/claim.entity';
import { CreatedAt, instantColumn } from '../../database/columns';

/**
 * A reader's wish to hear of updates to one explainer. The address is kept only for that,
 * unconfirmed until the link mailed to it is opened, and deleted on unsubscribing. The
 * unsubscribe link is signed (an HMAC of the row's id), so it needs no stored secret.
 */
@Entity('reader_subscriptions')
@Index('UQ_reader_subscriptions_claim_email', ['claimId', 'email'], { unique: true })
@Index('IDX_reader_subscriptions_confirm', ['confirmTokenHash'])
export class ReaderSubscription {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  @Column({ name: 'claim_id', type: 'uuid' })
  claimId: string;

  @ManyToOne(() => Claim, { nullable: false })
  @JoinColumn({ name: 'claim_id' })
  claim: Relation<Claim>;

  @Column({ type: 'varchar', length: 254 })
  email: string;

  /** SHA-256 of the token in the confirmation link; the token itself is never stored. */
  @Column({ name: 'confirm_token_hash', type: 'char', length: 64 })
  confirmTokenHash: string;

  @Column(instantColumn({ name: 'confirmed_at', nullable: true }))
  confirmedAt: Date | null;

  @CreatedAt()
  createdAt: Date;
}
