import { signoffDecisions, type ChecklistItem, type SignoffDecision } from '@skyledger/contracts';
import { Column, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn } from 'typeorm';
import type { Relation } from 'typeorm';
import { CreatedAt } from '../../database/columns';
import { User } from '../../users/entities/user.entity';
import { VerdictVersion } from './verdict-version.entity';

/** The copy desk's decision on one verdict version, with its notes and the checklist then. */
@Entity('signoff_decisions')
@Index('IDX_signoff_decisions_version', ['versionId', 'at'])
export class SignoffDecisionRecord {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  @Column({ name: 'claim_id', type: 'uuid' })
  claimId: string;

  @Column({ name: 'version_id', type: 'uuid' })
  versionId: string;

  @ManyToOne(() => VerdictVersion, { nullable: false })
  @JoinColumn({ name: 'version_id' })
  verdictVersion: Relation<VerdictVersion>;

  @Column({ type: 'enum', enum: signoffDecisions })
  decision: SignoffDecision;

  @Column({ type: 'text', nullable: true })
  notes: string | null;

  @Column({ name: 'decided_by_id', type: 'uuid' })
  decidedById: string;

  @ManyToOne(() => User, { nullable: false })
  @JoinColumn({ name: 'decided_by_id' })
  decidedBy: User;

  @Column({ type: 'json' })
  checklist: ChecklistItem[];

  @CreatedAt('at')
  at: Date;
}
