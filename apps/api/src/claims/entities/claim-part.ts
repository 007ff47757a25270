import { Column, JoinColumn, ManyToOne, PrimaryGeneratedColumn, VersionColumn } from 'typeorm';
import type { Relation } from 'typeorm';
import { CreatedAt, UpdatedAt } from '../../database/columns';
import { User } from '../../users/entities/user.entity';
import { Claim } from './claim.entity';

/**
 * What every record kept under one claim has: its claim, who added it, when, and a
 * version for optimistic locking. Each subclass is a table of its own.
 */
export abstract class ClaimPart {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  @Column({ name: 'claim_id', type: 'uuid' })
  claimId: string;

  @ManyToOne(() => Claim, { nullable: false })
  @JoinColumn({ name: 'claim_id' })
  claim: Relation<Claim>;

  @Column({ name: 'created_by_id', type: 'uuid' })
  createdById: string;

  @ManyToOne(() => User, { nullable: false })
  @JoinColumn({ name: 'created_by_id' })
  createdBy: User;

  @CreatedAt()
  createdAt: Date;

  @UpdatedAt()
  updatedAt: Date;

  @VersionColumn()
  version: number;
}
