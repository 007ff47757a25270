import {
  Inject,
  Injectable,
  Logger,
  type OnApplicationBootstrap,
  type OnModuleDestroy,
} from '@nestjs/common';
import { InjectRepository } from '@nestjs/typeorm';
import { randomUUID } from 'node:crypto';
import { Repository } from 'typeorm';
import { mailConfig, type MailConfig } from '../config/configuration';
import { OutboxMessage } from './entities/outbox-message.entity';
import { MailTransport } from './mail-transport';

const batchSize = 20;
const maxBackoffSeconds = 3600;

/**
 * Delivers queued mail. Several API instances may run this at once: each pass claims due
 * rows with one UPDATE (the claim id marks whose they are), so a row is sent by one pass
 * only. Rows left `sending` by a crashed process go back to `pending` after
 * OUTBOX_STALE_SECONDS.
 */
@Injectable()
export class OutboxWorker implements OnApplicationBootstrap, OnModuleDestroy {
  private readonly logger = new Logger(OutboxWorker.name);
  private timer: NodeJS.Timeout | undefined;
  private pass: Promise<void> | undefined;
  private stopped = false;

  constructor(
    @InjectRepository(OutboxMessage) private readonly outbox: Repository<OutboxMessage>,
    private readonly transport: MailTransport,
    @Inject(mailConfig.KEY) private readonly config: MailConfig,
  ) {}

  onApplicationBootstrap(): void {
    if (this.config.workerEnabled) this.schedule(0);
  }

  async onModuleDestroy(): Promise<void> {
    this.stopped = true;
    clearTimeout(this.timer);
    await this.pass;
  }

  /** Runs a pass soon, e.g. right after a transaction queued mail. */
  nudge(): void {
    if (this.config.workerEnabled && !this.stopped) this.schedule(0);
  }

  private schedule(delayMs: number): void {
    clearTimeout(this.timer);
    this.timer = setTimeout(() => {
      if (this.pass) return this.schedule(this.config.pollMs);
      this.pass = this.runPass()
        .catch((error: unknown) => this.logger.error(`outbox pass failed: ${String(error)}`))
        .finally(() => {
          this.pass = undefined;
          if (!this.stopped) this.schedule(this.config.pollMs);
        });
    }, delayMs);
  }

  /** One delivery pass; exposed for tests and the command line. */
  async runPass(): Promise<void> {
    await this.outbox.query(
      `UPDATE outbox_messages SET state = 'pending', claim_id = NULL
        WHERE state = 'sending' AND claimed_at < NOW(3) - INTERVAL ? SECOND`,
      [this.config.staleSeconds],
    );
    const claimId = randomUUID();
    await this.outbox.query(
      `UPDATE outbox_messages SET state = 'sending', claim_id = ?, claimed_at = NOW(3)
        WHERE state = 'pending' AND next_attempt_at <= NOW(3)
        ORDER BY next_attempt_at LIMIT ?`,
      [claimId, batchSize],
    );
    const claimed = await this.outbox.find({
      where: { claimId, state: 'sending' },
      order: { createdAt: 'ASC' },
    });
    for (const message of claimed) {
      if (this.stopped) break;
      await this.deliver(message, claimId);
    }
  }

  private async deliver(message: OutboxMessage, claimId: string): Promise<void> {
    try {
      await this.transport.send({
        to: message.toAddress,
        subject: message.subject,
        text: message.textBody,
        html: message.htmlBody,
        messageId: message.id,
      });
      await this.outbox.update(
        { id: message.id, claimId },
        {
          state: 'sent',
          sentAt: new Date(),
          attempts: message.attempts + 1,
          claimId: null,
          lastError: null,
        },
      );
    } catch (error) {
      const attempts = message.attempts + 1;
      const failed = attempts >= this.config.maxAttempts;
      const backoffSeconds = Math.min(maxBackoffSeconds, 5 * 2 ** (attempts - 1));
      this.logger.warn(
        `mail ${message.id} (${message.kind}) attempt ${attempts} failed${failed ? ', giving up' : ''}: ${String(error)}`,
      );
      await this.outbox.update(
        { id: message.id, claimId },
        {
          state: failed ? 'failed' : 'pending',
          attempts,
          claimId: null,
          lastError: String(error).slice(0, 2000),
          nextAttemptAt: new Date(Date.now() + backoffSeconds * 1000),
        },
      );
    }
  }
}
