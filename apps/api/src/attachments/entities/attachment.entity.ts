import { Column, Entity, Index, JoinColumn, ManyToOne, PrimaryGeneratedColumn } from 'typeorm';
import type { Relation } from 'typeorm';
import { Claim } from '../../claims/entities/claim.entity';
import { CreatedAt } from '../../database/columns';
import { User } from '../../users/entities/user.entity';

/**
 * An evidence file on a claim, or the file behind a dataset (no claim). The bytes live in storage under their SHA-256, so the same
 * file uploaded twice is stored once; each upload keeps its own row and name.
 */
@Entity('attachments')
@Index('IDX_attachments_claim', ['claimId', 'uploadedAt'])
@Index('IDX_attachments_sha256', ['sha256'])
export class Attachment {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  @Column({ name: 'claim_id', type: 'uuid', nullable: true })
  claimId: string | null;

  @ManyToOne(() => Claim, { nullable: true })
  @JoinColumn({ name: 'claim_id' })
  claim: Relation<Claim>;

  /** The name it was uploaded under, for display and downloads only; never a path. */
  @Column({ name: 'original_name', type: 'varchar', length: 255 })
  originalName: string;

  /** Sniffed from the bytes, never taken from the name or the browser. */
  @Column({ name: 'media_type', type: 'varchar', length: 100 })
  mediaType: string;

  @Column({ type: 'bigint', unsigned: true, transformer: { to: (v: number) => v, from: Number } })
  size: number;

  @Column({ type: 'char', length: 64 })
  sha256: string;

  @Column({ name: 'storage_key', type: 'varchar', length: 200 })
  storageKey: string;

  @Column({ name: 'uploaded_by_id', type: 'uuid' })
  uploadedById: string;

  @ManyToOne(() => User, { nullable: false })
  @JoinColumn({ name: 'uploaded_by_id' })
  uploadedBy: User;

  @CreatedAt('uploaded_at')
  uploadedAt: Date;
}
