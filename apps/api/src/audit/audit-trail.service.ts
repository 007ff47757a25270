import { Injectable } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import { AUDIT_PAGE_SIZE, type AuditEventView, type Page } from '@skyledger/contracts';
import { stringify } from 'csv-stringify';
import { Readable } from 'node:stream';
import { DataSource, type SelectQueryBuilder } from 'typeorm';
import { toPersonRef } from '../common/views/person-ref';
import { User } from '../users/entities/user.entity';
import { type AuditQueryDto } from './dto/audit-query.dto';
import { AuditEvent } from './entities/audit-event.entity';

const EXPORT_BATCH = 1000;

type Row = AuditEvent & { actor: User | null };

/** The audit trail, read-only: filtered pages for the desk chief, and the same as CSV. */
@Injectable()
export class AuditTrailService {
  constructor(@InjectDataSource() private readonly dataSource: DataSource) {}

  async page(query: AuditQueryDto): Promise<Page<AuditEventView>> {
    const page = query.page ?? 1;
    const [rows, total] = await this.filtered(query)
      .skip((page - 1) * AUDIT_PAGE_SIZE)
      .take(AUDIT_PAGE_SIZE)
      .getManyAndCount();
    return { items: (rows as Row[]).map(toView), total, page, pageSize: AUDIT_PAGE_SIZE };
  }

  /** Every matching event as CSV, oldest first, read in batches so memory stays flat. */
  export(query: AuditQueryDto): Readable {
    const filtered = () => this.filtered(query).orderBy('e.at', 'ASC').addOrderBy('e.id', 'ASC');
    async function* rows() {
      for (let offset = 0; ; offset += EXPORT_BATCH) {
        const batch = (await filtered().skip(offset).take(EXPORT_BATCH).getMany()) as Row[];
        for (const event of batch) {
          yield [
            event.at.toISOString(),
            event.actor?.displayName ?? 'system',
            event.actorId ?? '',
            event.action,
            event.entityType,
            event.entityId,
            event.claimId ?? '',
            JSON.stringify(event.summary),
          ];
        }
        if (batch.length < EXPORT_BATCH) return;
      }
    }
    return Readable.from(rows()).pipe(
      stringify({
        header: true,
        columns: [
          'at',
          'actor',
          'actor_id',
          'action',
          'entity_type',
          'entity_id',
          'claim_id',
          'summary',
        ],
      }),
    );
  }

  private filtered(query: AuditQueryDto): SelectQueryBuilder<AuditEvent> {
    const builder = this.dataSource
      .getRepository(AuditEvent)
      .createQueryBuilder('e')
      .leftJoinAndMapOne('e.actor', User, 'actor', 'actor.id = e.actor_id')
      .orderBy('e.at', 'DESC')
      .addOrderBy('e.id', 'DESC');
    if (query.action) builder.andWhere('e.action = :action', { action: query.action });
    if (query.entityType) builder.andWhere('e.entity_type = :type', { type: query.entityType });
    if (query.actor) builder.andWhere('e.actor_id = :actor', { actor: query.actor });
    if (query.claim) builder.andWhere('e.claim_id = :claim', { claim: query.claim });
    if (query.from) builder.andWhere('e.at >= :from', { from: `${query.from} 00:00:00` });
    if (query.to) {
      builder.andWhere('e.at < DATE_ADD(:to, INTERVAL 1 DAY)', { to: query.to });
    }
    return builder;
  }
}

function toView(event: Row): AuditEventView {
  return {
    id: event.id,
    at: event.at.toISOString(),
    actor: event.actor ? toPersonRef(event.actor) : null,
    action: event.action,
    entityType: event.entityType,
    entityId: event.entityId,
    claimId: event.claimId,
    summary: event.summary,
  };
}
