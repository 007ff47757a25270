import { claimantKinds, type ClaimantKind } from '@skyledger/contracts';
import { Column, Entity, Index, PrimaryGeneratedColumn, VersionColumn } from 'typeorm';
import { CreatedAt, UpdatedAt } from '../../database/columns';

/** Who made a claim. Private individuals keep their name off public pages by default. */
@Entity('claimants')
export class Claimant {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  @Index('IDX_claimants_name')
  @Column({ type: 'varchar', length: 160 })
  name: string;

  @Column({ type: 'enum', enum: claimantKinds })
  kind: ClaimantKind;

  @Column({ type: 'varchar', length: 160, nullable: true })
  affiliation: string | null;

  @Column({ type: 'text', nullable: true })
  notes: string | null;

  /** Only a desk chief may set this for a private individual. */
  @Column({ name: 'name_shown_publicly', type: 'boolean', default: false })
  nameShownPublicly: boolean;

  @Column({ name: 'created_by_id', type: 'uuid', nullable: true })
  createdById: string | null;

  @CreatedAt()
  createdAt: Date;

  @UpdatedAt()
  updatedAt: Date;

  @VersionColumn()
  version: number;
}
