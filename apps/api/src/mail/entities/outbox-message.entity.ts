import { outboxStates, type OutboxState } from '@skyledger/contracts';
import { Column, Entity, Index, PrimaryGeneratedColumn } from 'typeorm';
import { CreatedAt, UpdatedAt, instantColumn } from '../../database/columns';

/**
 * An e-mail waiting to be delivered. Rows are written in the same transaction as the
 * change they report, and the outbox worker delivers them afterwards, so a mail is
 * never lost when the SMTP relay is down and never sent for a change that rolled back.
 */
@Entity('outbox_messages')
@Index('IDX_outbox_messages_due', ['state', 'nextAttemptAt'])
export class OutboxMessage {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  /** What the mail is about (`invitation`, `password_reset`, ...), for the outbox page. */
  @Column({ type: 'varchar', length: 64 })
  kind: string;

  @Column({ name: 'to_address', type: 'varchar', length: 254 })
  toAddress: string;

  @Column({ type: 'varchar', length: 255 })
  subject: string;

  @Column({ name: 'text_body', type: 'mediumtext' })
  textBody: string;

  @Column({ name: 'html_body', type: 'mediumtext', nullable: true })
  htmlBody: string | null;

  @Column({ type: 'enum', enum: outboxStates, default: 'pending' })
  state: OutboxState;

  @Column({ type: 'int', unsigned: true, default: 0 })
  attempts: number;

  @Column(instantColumn({ name: 'next_attempt_at', default: () => 'CURRENT_TIMESTAMP(3)' }))
  nextAttemptAt: Date;

  /** Which worker pass holds the row while it is `sending`. */
  @Column({ name: 'claim_id', type: 'uuid', nullable: true })
  claimId: string | null;

  @Column(instantColumn({ name: 'claimed_at', nullable: true }))
  claimedAt: Date | null;

  @Column({ name: 'last_error', type: 'text', nullable: true })
  lastError: string | null;

  @Column(instantColumn({ name: 'sent_at', nullable: true }))
  sentAt: Date | null;

  @CreatedAt()
  createdAt: Date;

  @UpdatedAt()
  updatedAt: Date;
}
