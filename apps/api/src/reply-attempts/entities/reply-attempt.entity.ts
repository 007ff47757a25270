import {
  replyChannels,
  replyOutcomes,
  type ReplyChannel,
  type ReplyOutcome,
} from '@skyledger/contracts';
import { Column, Entity, Index } from 'typeorm';
import { ClaimPart } from '../../claims/entities/claim-part';
import { instantColumn } from '../../database/columns';

/** One attempt to give the claimant the right of reply. */
@Entity('reply_attempts')
@Index('IDX_reply_attempts_claim', ['claimId', 'contactedAt'])
export class ReplyAttempt extends ClaimPart {
  @Column({ type: 'varchar', length: 200 })
  contacted: string;

  @Column(instantColumn({ name: 'contacted_at' }))
  contactedAt: Date;

  @Column({ type: 'enum', enum: replyChannels })
  channel: ReplyChannel;

  @Column(instantColumn({ nullable: true }))
  deadline: Date | null;

  @Column({ type: 'enum', enum: replyOutcomes, default: 'awaiting' })
  outcome: ReplyOutcome;

  @Column({ type: 'text', nullable: true })
  reply: string | null;
}
