import { Column, Entity, Index, PrimaryGeneratedColumn } from 'typeorm';
import { CreatedAt } from '../../database/columns';

/**
 * One entry of the append-only audit trail, written in the same transaction as the
 * change it records. Nothing in the API updates or deletes these rows.
 */
@Entity('audit_events')
@Index('IDX_audit_events_entity', ['entityType', 'entityId', 'at'])
@Index('IDX_audit_events_at', ['at'])
@Index('IDX_audit_events_claim', ['claimId', 'at'])
export class AuditEvent {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  /** The person who acted; null for the system (scheduler, seed, command line). */
  @Column({ name: 'actor_id', type: 'uuid', nullable: true })
  actorId: string | null;

  /** Dotted verb, e.g. `user.invited`, `user.role_changed`. */
  @Column({ type: 'varchar', length: 64 })
  action: string;

  @Column({ name: 'entity_type', type: 'varchar', length: 64 })
  entityType: string;

  @Column({ name: 'entity_id', type: 'uuid' })
  entityId: string;

  /** The claim this change belongs to (the claim itself or one of its parts), for its history. */
  @Column({ name: 'claim_id', type: 'uuid', nullable: true })
  claimId: string | null;

  /** What changed, as `{ field: { from, to } }` or a short free-form record. */
  @Column({ type: 'json' })
  summary: Record<string, unknown>;

  @CreatedAt('at')
  at: Date;
}
