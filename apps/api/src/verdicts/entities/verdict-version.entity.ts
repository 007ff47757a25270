import { verdictVersionStates, type VerdictVersionState } from '@skyledger/contracts';
import { type ExplainerDocument } from '@skyledger/explainer';
import { Column, Entity, Index, JoinColumn, ManyToOne } from 'typeorm';
import { Claimant } from '../../claimants/entities/claimant.entity';
import { ClaimPart } from '../../claims/entities/claim-part';
import { instantColumn } from '../../database/columns';
import { RatingLevel } from '../../ratings/entities/rating-level.entity';
import { User } from '../../users/entities/user.entity';

export interface ClearedParts {
  appearanceIds: string[];
  sourceIds: string[];
}

/**
 * One version of a claim's verdict: rating, bottom line and explainer. A draft changes
 * with every save; submitting for sign-off freezes it. `createdBy` drafted it.
 */
@Entity('verdict_versions')
@Index('UQ_verdict_versions_claim_number', ['claimId', 'number'], { unique: true })
export class VerdictVersion extends ClaimPart {
  /** 1, 2, 3… per claim. */
  @Column({ type: 'int', unsigned: true })
  number: number;

  @Column({ type: 'enum', enum: verdictVersionStates, default: 'draft' })
  state: VerdictVersionState;

  @Column({ name: 'rating_id', type: 'varchar', length: 40, nullable: true })
  ratingId: string | null;

  @ManyToOne(() => RatingLevel, { nullable: true })
  @JoinColumn({ name: 'rating_id' })
  rating: RatingLevel | null;

  @Column({ name: 'bottom_line', type: 'text' })
  bottomLine: string;

  /** The explainer as a Tiptap document, cleaned of anything outside the schema. */
  @Column({ type: 'json' })
  body: ExplainerDocument;

  /** The body rendered on the server and sanitized with the allow-list. */
  @Column({ name: 'body_html', type: 'mediumtext' })
  bodyHtml: string;

  @Column({ name: 'primary_source_id', type: 'uuid', nullable: true })
  primarySourceId: string | null;

  @Column({ name: 'last_edited_by_id', type: 'uuid' })
  lastEditedById: string;

  @ManyToOne(() => User, { nullable: false })
  @JoinColumn({ name: 'last_edited_by_id' })
  lastEditedBy: User;

  @Column(instantColumn({ name: 'submitted_at', nullable: true }))
  submittedAt: Date | null;

  /**
   * The claim as the copy desk cleared it with this version: its words, summary and
   * claimant, which readers are shown with it (and `clearedParts`). The desk may edit the claim for a
   * correction; readers see the edit only once a version that has it is cleared and
   * published. Null until cleared.
   */
  @Column({ name: 'claim_text', type: 'text', nullable: true })
  claimText: string | null;

  @Column({ name: 'claim_summary', type: 'varchar', length: 75, nullable: true })
  claimSummary: string | null;

  @Column({ name: 'claimant_id', type: 'uuid', nullable: true })
  claimantId: string | null;

  @ManyToOne(() => Claimant, { nullable: true })
  @JoinColumn({ name: 'claimant_id' })
  claimant: Claimant | null;

  /** Which appearances and sources the claim had when cleared: those readers are shown. */
  @Column({ name: 'cleared_parts', type: 'json', nullable: true })
  clearedParts: ClearedParts | null;
}
