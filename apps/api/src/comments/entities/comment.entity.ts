import { Column, Entity, Index } from 'typeorm';
import { ClaimPart } from '../../claims/entities/claim-part';
import { instantColumn } from '../../database/columns';

/** A note on a claim by anyone on the desk; only its author edits it. */
@Entity('comments')
@Index('IDX_comments_claim', ['claimId', 'createdAt'])
export class Comment extends ClaimPart {
  @Column({ type: 'text' })
  body: string;

  @Column(instantColumn({ name: 'edited_at', nullable: true }))
  editedAt: Date | null;
}
