import {
  claimStatuses,
  setAsideReasons,
  type ClaimStatus,
  type SetAsideReason,
} from '@skyledger/contracts';
import {
  Column,
  Entity,
  Index,
  JoinColumn,
  ManyToOne,
  OneToMany,
  PrimaryGeneratedColumn,
  VersionColumn,
} from 'typeorm';
import { Claimant } from '../../claimants/entities/claimant.entity';
import { CreatedAt, UpdatedAt, instantColumn } from '../../database/columns';
import { User } from '../../users/entities/user.entity';
import { ClaimTopic } from './claim-topic.entity';

/**
 * One checkable statement as said, with its neutral summary. The indexes serve the
 * queue's common filters and sorts, each ending in the default sort (filed, newest
 * first); test/claim-queue-explain.e2e-spec.ts checks their plans at 100 000 claims.
 */
@Entity('claims')
@Index('IDX_claims_filed_at', ['createdAt'])
@Index('IDX_claims_updated_at', ['updatedAt', 'createdAt'])
@Index('IDX_claims_summary', ['summary', 'createdAt'])
@Index('IDX_claims_status', ['status', 'createdAt'])
@Index('IDX_claims_status_updated_at', ['status', 'updatedAt', 'createdAt'])
@Index('IDX_claims_status_summary', ['status', 'summary', 'createdAt'])
@Index('IDX_claims_assignee', ['assigneeId', 'status', 'createdAt'])
@Index('IDX_claims_filed_by', ['filedById', 'status', 'createdAt'])
@Index('IDX_claims_claimant', ['claimantId', 'createdAt'])
@Index('IDX_claims_legal', ['legalReview', 'status', 'createdAt'])
@Index('IDX_claims_first_published', ['firstPublishedAt'])
export class Claim {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  /** The stable part of its public address, set at its first publication. */
  @Index('UQ_claims_slug', { unique: true })
  @Column({ type: 'varchar', length: 100, nullable: true })
  slug: string | null;

  /** When its explainer was first published: the order of the reader index. */
  @Column(instantColumn({ name: 'first_published_at', nullable: true }))
  firstPublishedAt: Date | null;

  /** The claim as said, word for word. */
  @Column({ type: 'text' })
  text: string;

  @Column({ type: 'varchar', length: 75 })
  summary: string;

  @Column({ type: 'enum', enum: claimStatuses, default: 'filed' })
  status: ClaimStatus;

  @Column({ name: 'legal_review', type: 'boolean', default: false })
  legalReview: boolean;

  @Column({ name: 'claimant_id', type: 'uuid' })
  claimantId: string;

  @ManyToOne(() => Claimant, { nullable: false })
  @JoinColumn({ name: 'claimant_id' })
  claimant: Claimant;

  @Column({ name: 'assignee_id', type: 'uuid', nullable: true })
  assigneeId: string | null;

  @ManyToOne(() => User, { nullable: true })
  @JoinColumn({ name: 'assignee_id' })
  assignee: User | null;

  @Column({ name: 'filed_by_id', type: 'uuid' })
  filedById: string;

  @ManyToOne(() => User, { nullable: false })
  @JoinColumn({ name: 'filed_by_id' })
  filedBy: User;

  @Column({ name: 'set_aside_reason', type: 'enum', enum: setAsideReasons, nullable: true })
  setAsideReason: SetAsideReason | null;

  @Column({ name: 'set_aside_note', type: 'text', nullable: true })
  setAsideNote: string | null;

  /** Set when a desk chief waives the right of reply, with the reason. */
  @Column({ name: 'reply_waiver_reason', type: 'text', nullable: true })
  replyWaiverReason: string | null;

  @Column({ name: 'reply_waived_by_id', type: 'uuid', nullable: true })
  replyWaivedById: string | null;

  @ManyToOne(() => User, { nullable: true })
  @JoinColumn({ name: 'reply_waived_by_id' })
  replyWaivedBy: User | null;

  @Column(instantColumn({ name: 'reply_waived_at', nullable: true }))
  replyWaivedAt: Date | null;

  @OneToMany(() => ClaimTopic, (topic) => topic.claim, { cascade: ['insert'] })
  topics: ClaimTopic[];

  /** When the claim was filed. */
  @CreatedAt()
  createdAt: Date;

  @UpdatedAt()
  updatedAt: Date;

  @VersionColumn()
  version: number;
}
