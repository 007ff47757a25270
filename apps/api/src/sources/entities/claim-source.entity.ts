import { Column, Entity, Index, JoinColumn, ManyToOne, PrimaryColumn } from 'typeorm';
import type { Relation } from 'typeorm';
import { Claim } from '../../claims/entities/claim.entity';
import { CreatedAt } from '../../database/columns';
import { User } from '../../users/entities/user.entity';
import { Source } from './source.entity';

/** A source cited for a claim. Unlinking removes this row; the source itself stays. */
@Entity('claim_sources')
@Index('IDX_claim_sources_source', ['sourceId'])
export class ClaimSource {
  @PrimaryColumn({ name: 'claim_id', type: 'uuid' })
  claimId: string;

  @PrimaryColumn({ name: 'source_id', type: 'uuid' })
  sourceId: string;

  @ManyToOne(() => Claim, { nullable: false })
  @JoinColumn({ name: 'claim_id' })
  claim: Relation<Claim>;

  @ManyToOne(() => Source, { nullable: false })
  @JoinColumn({ name: 'source_id' })
  source: Source;

  @Column({ name: 'linked_by_id', type: 'uuid' })
  linkedById: string;

  @ManyToOne(() => User, { nullable: false })
  @JoinColumn({ name: 'linked_by_id' })
  linkedBy: User;

  @CreatedAt('linked_at')
  linkedAt: Date;
}
