import { Column, Entity, Index, JoinColumn, ManyToOne } from 'typeorm';
import { Attachment } from '../../attachments/entities/attachment.entity';
import { ClaimPart } from '../../claims/entities/claim-part';
import { instantColumn } from '../../database/columns';

/** Where and when a claim was seen. `seenAt` is the instant (UTC); `seenTimeZone` its zone. */
@Entity('appearances')
@Index('IDX_appearances_claim', ['claimId', 'seenAt'])
export class Appearance extends ClaimPart {
  @Column({ type: 'varchar', length: 2048 })
  url: string;

  @Column({ type: 'varchar', length: 160 })
  outlet: string;

  @Column(instantColumn({ name: 'seen_at' }))
  seenAt: Date;

  @Column({ name: 'seen_time_zone', type: 'varchar', length: 64 })
  seenTimeZone: string;

  /** At most one appearance of a claim is its first known one. */
  @Column({ name: 'is_first_known', type: 'boolean', default: false })
  isFirstKnown: boolean;

  @Column({ name: 'capture_attachment_id', type: 'uuid', nullable: true })
  captureAttachmentId: string | null;

  @ManyToOne(() => Attachment, { nullable: true })
  @JoinColumn({ name: 'capture_attachment_id' })
  capture: Attachment | null;
}
