import { Inject, Injectable } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import { createHmac, timingSafeEqual } from 'node:crypto';
import { DataSource, IsNull, Not, type EntityManager } from 'typeorm';
import { type Claim } from '../claims/entities/claim.entity';
import { randomToken, sha256Hex } from '../common/security/tokens';
import { appConfig, authConfig, type AppConfig, type AuthConfig } from '../config/configuration';
import { OutboxService } from '../mail/outbox.service';
import { OutboxWorker } from '../mail/outbox.worker';
import { readerConfirmMail, readerUpdateMail } from '../mail/templates/publishing.mails';
import { ReaderSubscription } from './entities/reader-subscription.entity';
import { explainerUrl } from './publication-view';

/**
 * Readers asking for mail when an explainer is updated: double opt-in (nothing is sent
 * but the confirmation until its link is opened), a one-click unsubscribe link in every
 * mail, and the address deleted on unsubscribing.
 */
@Injectable()
export class ReaderSubscriptionsService {
  constructor(
    @InjectDataSource() private readonly dataSource: DataSource,
    private readonly outbox: OutboxService,
    private readonly worker: OutboxWorker,
    @Inject(appConfig.KEY) private readonly app: AppConfig,
    @Inject(authConfig.KEY) private readonly auth: AuthConfig,
  ) {}

  /**
   * Queues a confirmation to the address. The answer is the same whether or not the address
   * was subscribed already, so the form tells nobody who reads what. `summary` is the
   * claim's as readers see it.
   */
  async subscribe(claim: Claim, summary: string, email: string): Promise<void> {
    const address = email.trim().toLowerCase();
    const token = randomToken();
    await this.dataSource.transaction(async (manager) => {
      const existing = await manager.findOne(ReaderSubscription, {
        where: { claimId: claim.id, email: address },
        lock: { mode: 'pessimistic_write' },
      });
      if (existing?.confirmedAt) return;
      if (existing) {
        existing.confirmTokenHash = sha256Hex(token);
        await manager.save(existing);
      } else {
        await manager.insert(ReaderSubscription, {
          claimId: claim.id,
          email: address,
          confirmTokenHash: sha256Hex(token),
        });
      }
      const base = explainerUrl(this.app.appUrl, claim.slug!);
      await this.outbox.enqueue(manager, {
        kind: 'reader_confirm',
        to: address,
        ...readerConfirmMail({
          summary,
          confirmUrl: `${base}/subscription/confirm?token=${encodeURIComponent(token)}`,
          siteName: this.app.newsroomName,
        }),
      });
    });
    this.worker.nudge();
  }

  /** Confirms the subscription the token belongs to; false when the link is unknown or used. */
  async confirm(token: string): Promise<boolean> {
    const subscription = await this.dataSource.manager.findOne(ReaderSubscription, {
      where: { confirmTokenHash: sha256Hex(token), confirmedAt: IsNull() },
    });
    if (!subscription) return false;
    await this.dataSource.manager.update(ReaderSubscription, subscription.id, {
      confirmedAt: new Date(),
    });
    return true;
  }

  /** Deletes the subscription the signed token names; false when the token is wrong. */
  async unsubscribe(token: string): Promise<boolean> {
    const [id, signature] = token.split('.');
    if (!id || !signature || !this.validSignature(id, signature)) return false;
    await this.dataSource.manager.delete(ReaderSubscription, { id });
    return true;
  }

  /** Queues the update note to every confirmed subscriber of the claim, in the caller's transaction. */
  async notifyUpdate(
    manager: EntityManager,
    claim: Claim,
    note: { summary: string; kindLabel: string; text: string; url: string },
  ): Promise<number> {
    const subscribers = await manager.find(ReaderSubscription, {
      where: { claimId: claim.id, confirmedAt: Not(IsNull()) },
    });
    for (const subscriber of subscribers) {
      await this.outbox.enqueue(manager, {
        kind: 'reader_update',
        to: subscriber.email,
        ...readerUpdateMail({
          ...note,
          unsubscribeUrl: `${note.url}/subscription/unsubscribe?token=${this.unsubscribeToken(subscriber.id)}`,
          siteName: this.app.newsroomName,
        }),
      });
    }
    return subscribers.length;
  }

  private unsubscribeToken(id: string): string {
    return `${id}.${this.sign(id)}`;
  }

  /** An HMAC of the row id under a key derived from the API's secret for this use only. */
  private sign(id: string): string {
    return createHmac('sha256', `reader-unsubscribe:${this.auth.jwtSecret}`)
      .update(id)
      .digest('base64url');
  }

  private validSignature(id: string, signature: string): boolean {
    const expected = Buffer.from(this.sign(id));
    const given = Buffer.from(signature);
    return expected.length === given.length && timingSafeEqual(expected, given);
  }
}
