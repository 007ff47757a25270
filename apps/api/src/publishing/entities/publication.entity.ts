import { updateNoteKinds, type UpdateNoteKind } from '@skyledger/contracts';
import { Column, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn } from 'typeorm';
import type { Relation } from 'typeorm';
import { Claim } from '../../claims/entities/claim.entity';
import { CreatedAt, instantColumn } from '../../database/columns';
import { User } from '../../users/entities/user.entity';
import { VerdictVersion } from '../../verdicts/entities/verdict-version.entity';

export const publicationStates = ['scheduled', 'published', 'cancelled'] as const;
export type PublicationState = (typeof publicationStates)[number];

/**
 * One publication of a cleared verdict version: now, or at a scheduled instant kept with
 * the time zone it was set in. Rows are never deleted: every publication stays readable.
 */
@Entity('publications')
@Index('UQ_publications_claim_sequence', ['claimId', 'sequence'], { unique: true })
@Index('IDX_publications_due', ['state', 'scheduledFor'])
@Index('IDX_publications_published', ['state', 'publishedAt'])
export class Publication {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  @Column({ name: 'claim_id', type: 'uuid' })
  claimId: string;

  @ManyToOne(() => Claim, { nullable: false })
  @JoinColumn({ name: 'claim_id' })
  claim: Relation<Claim>;

  @Column({ name: 'version_id', type: 'uuid' })
  versionId: string;

  @ManyToOne(() => VerdictVersion, { nullable: false })
  @JoinColumn({ name: 'version_id' })
  verdictVersion: Relation<VerdictVersion>;

  /** 1 for the first publication of the claim, then 2, 3… with each update note. */
  @Column({ type: 'int', unsigned: true })
  sequence: number;

  @Column({ type: 'enum', enum: publicationStates })
  state: PublicationState;

  @Column(instantColumn({ name: 'scheduled_for', nullable: true }))
  scheduledFor: Date | null;

  @Column({ name: 'scheduled_time_zone', type: 'varchar', length: 64, nullable: true })
  scheduledTimeZone: string | null;

  @Column(instantColumn({ name: 'published_at', nullable: true }))
  publishedAt: Date | null;

  @Column({ name: 'note_kind', type: 'enum', enum: updateNoteKinds, nullable: true })
  noteKind: UpdateNoteKind | null;

  @Column({ name: 'note_text', type: 'text', nullable: true })
  noteText: string | null;

  @Column({ name: 'created_by_id', type: 'uuid' })
  createdById: string;

  @ManyToOne(() => User, { nullable: false })
  @JoinColumn({ name: 'created_by_id' })
  createdBy: User;

  @CreatedAt()
  createdAt: Date;
}
