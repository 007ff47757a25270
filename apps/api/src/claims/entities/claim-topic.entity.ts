import { Entity, Index, JoinColumn, ManyToOne, PrimaryColumn } from 'typeorm';
import type { Relation } from 'typeorm';
import { Claim } from './claim.entity';

/** A topic tag on a claim; a table of its own so the queue filters by topic through an index. */
@Entity('claim_topics')
@Index('IDX_claim_topics_topic', ['topic', 'claimId'])
export class ClaimTopic {
  @PrimaryColumn({ name: 'claim_id', type: 'uuid' })
  claimId: string;

  @PrimaryColumn({ type: 'varchar', length: 40 })
  topic: string;

  @ManyToOne(() => Claim, (claim) => claim.topics, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'claim_id' })
  claim: Relation<Claim>;
}
