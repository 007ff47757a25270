import { Injectable } from '@nestjs/common';
import { type EntityManager } from 'typeorm';
import { AuditEvent } from './entities/audit-event.entity';

export interface AuditRecord {
  actorId: string | null;
  action: string;
  entityType: string;
  entityId: string;
  summary?: Record<string, unknown>;
  /** Set for changes to a claim or its parts, so they show in the claim's history. */
  claimId?: string | null;
}

/** Writes the audit trail. Always called with the transaction of the change it records. */
@Injectable()
export class AuditService {
  async record(manager: EntityManager, record: AuditRecord): Promise<void> {
    await manager.save(
      manager.create(AuditEvent, {
        ...record,
        summary: record.summary ?? {},
        claimId: record.claimId ?? null,
      }),
    );
  }
}
