import { Column, JoinColumn, ManyToOne } from 'typeorm';
import type { Relation } from 'typeorm';
import { AuthoredRecord } from '../../database/authored-record';
import { Claim } from './claim.entity';

/** A record kept under one claim: an authored record that belongs to its claim. */
export abstract class ClaimPart extends AuthoredRecord {
  @Column({ name: 'claim_id', type: 'uuid' })
  claimId: string;

  @ManyToOne(() => Claim, { nullable: false })
  @JoinColumn({ name: 'claim_id' })
  claim: Relation<Claim>;
}
