import { Injectable } from '@nestjs/common';
import { type EntityManager } from 'typeorm';
import { OutboxMessage } from './entities/outbox-message.entity';

export interface MailToQueue {
  kind: string;
  to: string;
  subject: string;
  text: string;
  html?: string;
}

/** Queues e-mail in the caller's transaction; the outbox worker delivers it after commit. */
@Injectable()
export class OutboxService {
  async enqueue(manager: EntityManager, mail: MailToQueue): Promise<void> {
    await manager.insert(OutboxMessage, {
      kind: mail.kind,
      toAddress: mail.to,
      subject: mail.subject,
      textBody: mail.text,
      htmlBody: mail.html ?? null,
    });
  }
}
