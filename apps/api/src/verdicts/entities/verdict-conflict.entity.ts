import { type ExplainerDocument } from '@skyledger/explainer';
import { Column, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn } from 'typeorm';
import { CreatedAt } from '../../database/columns';
import { User } from '../../users/entities/user.entity';

/**
 * A save of a verdict draft that arrived with a stale version. It is refused (409), and
 * kept here, so the words of both editors can be recovered and merged by hand.
 */
@Entity('verdict_conflicts')
@Index('IDX_verdict_conflicts_claim', ['claimId', 'at'])
export class VerdictConflict {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  @Column({ name: 'claim_id', type: 'uuid' })
  claimId: string;

  @Column({ name: 'version_id', type: 'uuid' })
  versionId: string;

  @Column({ name: 'saved_by_id', type: 'uuid' })
  savedById: string;

  @ManyToOne(() => User, { nullable: false })
  @JoinColumn({ name: 'saved_by_id' })
  savedBy: User;

  @Column({ name: 'rating_id', type: 'varchar', length: 40, nullable: true })
  ratingId: string | null;

  @Column({ name: 'bottom_line', type: 'text', nullable: true })
  bottomLine: string | null;

  @Column({ type: 'json', nullable: true })
  body: ExplainerDocument | null;

  @CreatedAt('at')
  at: Date;
}
