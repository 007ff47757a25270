import { Injectable } from '@nestjs/common';
import { type NotificationKind } from '@skyledger/contracts';
import { type EntityManager } from 'typeorm';
import { type User } from '../users/entities/user.entity';
import { OutboxService } from './outbox.service';
import { type MailContent } from './templates/mail-layout';

/**
 * Queues a notification to each person, in the caller's transaction, unless they have
 * turned that kind off or are not active. Returns how many mails were queued, so the
 * caller can nudge the outbox worker after commit.
 */
@Injectable()
export class NotificationsService {
  constructor(private readonly outbox: OutboxService) {}

  async notify(
    manager: EntityManager,
    kind: NotificationKind,
    recipients: readonly User[],
    compose: (recipient: User) => MailContent,
  ): Promise<number> {
    const seen = new Set<string>();
    let queued = 0;
    for (const recipient of recipients) {
      if (seen.has(recipient.id) || recipient.status !== 'active') continue;
      seen.add(recipient.id);
      if (recipient.notificationsOff?.includes(kind)) continue;
      await this.outbox.enqueue(manager, { kind, to: recipient.email, ...compose(recipient) });
      queued += 1;
    }
    return queued;
  }
}
