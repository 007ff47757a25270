import { HttpStatus, Injectable } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import { outboxStates, type OutboxMessageView, type OutboxPage } from '@skyledger/contracts';
import { DataSource } from 'typeorm';
import { AuditService } from '../audit/audit.service';
import { type AuthenticatedUser } from '../auth/authenticated-user';
import { ApiError } from '../common/errors/api-error';
import { type OutboxQueryDto } from './dto/outbox-query.dto';
import { OutboxMessage } from './entities/outbox-message.entity';
import { OutboxWorker } from './outbox.worker';

const PAGE_SIZE = 50;

function toView(message: OutboxMessage): OutboxMessageView {
  return {
    id: message.id,
    kind: message.kind,
    to: message.toAddress,
    subject: message.subject,
    state: message.state,
    attempts: message.attempts,
    lastError: message.lastError,
    nextAttemptAt: message.nextAttemptAt.toISOString(),
    sentAt: message.sentAt?.toISOString() ?? null,
    createdAt: message.createdAt.toISOString(),
  };
}

/** The desk chief's view of the outbox: every mail with its state, and retrying a failed one. */
@Injectable()
export class OutboxAdminService {
  constructor(
    @InjectDataSource() private readonly dataSource: DataSource,
    private readonly worker: OutboxWorker,
    private readonly audit: AuditService,
  ) {}

  async list(query: OutboxQueryDto): Promise<OutboxPage> {
    const page = query.page ?? 1;
    const repository = this.dataSource.getRepository(OutboxMessage);
    const [messages, total] = await repository.findAndCount({
      where: query.state ? { state: query.state } : {},
      order: { createdAt: 'DESC', id: 'ASC' },
      skip: (page - 1) * PAGE_SIZE,
      take: PAGE_SIZE,
    });
    const rows = await repository
      .createQueryBuilder('m')
      .select('m.state', 'state')
      .addSelect('COUNT(*)', 'count')
      .groupBy('m.state')
      .getRawMany<{ state: OutboxMessage['state']; count: string }>();
    const counts = Object.fromEntries(
      outboxStates.map((state) => [state, 0]),
    ) as OutboxPage['counts'];
    for (const row of rows) counts[row.state] = Number(row.count);
    return { items: messages.map(toView), total, page, pageSize: PAGE_SIZE, counts };
  }

  /** Puts a failed (or waiting) mail back in line now, with a fresh count of attempts. */
  async retry(actor: AuthenticatedUser, id: string): Promise<OutboxMessageView> {
    await this.dataSource.transaction(async (manager) => {
      const message = await manager.findOne(OutboxMessage, {
        where: { id },
        lock: { mode: 'pessimistic_write' },
      });
      if (!message) throw new ApiError(HttpStatus.NOT_FOUND, 'No such mail in the outbox');
      if (message.state === 'sent' || message.state === 'sending') {
        throw ApiError.conflict(
          message.state === 'sent' ? 'This mail was sent already' : 'This mail is being sent now',
          { state: message.state },
        );
      }
      await manager.update(OutboxMessage, id, {
        state: 'pending',
        attempts: 0,
        nextAttemptAt: new Date(),
        lastError: null,
      });
      await this.audit.record(manager, {
        actorId: actor.id,
        action: 'outbox.retried',
        entityType: 'outbox_message',
        entityId: id,
        summary: { to: message.toAddress, kind: message.kind, was: message.state },
      });
    });
    this.worker.nudge();
    return toView(await this.dataSource.getRepository(OutboxMessage).findOneByOrFail({ id }));
  }
}
