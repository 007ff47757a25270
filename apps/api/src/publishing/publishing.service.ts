import { HttpStatus, Inject, Injectable, Logger } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import { updateNoteKindLabels, type PublicationView } from '@skyledger/contracts';
import { DataSource, In, LessThanOrEqual, type EntityManager } from 'typeorm';
import { AuditService } from '../audit/audit.service';
import { type AuthenticatedUser } from '../auth/authenticated-user';
import { ClaimsService } from '../claims/claims.service';
import { type Claim } from '../claims/entities/claim.entity';
import { ApiError } from '../common/errors/api-error';
import { appConfig, type AppConfig } from '../config/configuration';
import { NotificationsService } from '../mail/notifications.service';
import { OutboxWorker } from '../mail/outbox.worker';
import { publishedMail, scheduledPublishedMail } from '../mail/templates/publishing.mails';
import { SearchIndexService } from '../search/search-index.service';
import { User } from '../users/entities/user.entity';
import { claimAsCleared } from '../verdicts/claim-as-cleared';
import { VerdictVersion } from '../verdicts/entities/verdict-version.entity';
import { type PublishClaimDto } from './dto/publish-claim.dto';
import { Publication } from './entities/publication.entity';
import { explainerUrl, toPublicationView } from './publication-view';
import { ReaderSubscriptionsService } from './reader-subscriptions.service';
import { uniqueSlug } from './slug';

/** A scheduled instant must be at least this far ahead, so it is not in the past on arrival. */
const MIN_LEAD_MS = 60_000;

/**
 * Publishing cleared verdicts: now, or at a scheduled instant (an embargo), which the
 * scheduler honours. Nothing about a publication is visible to readers before it is
 * published: the reader side reads published rows only.
 */
@Injectable()
export class PublishingService {
  private readonly logger = new Logger(PublishingService.name);

  constructor(
    @InjectDataSource() private readonly dataSource: DataSource,
    private readonly claims: ClaimsService,
    private readonly audit: AuditService,
    private readonly notifications: NotificationsService,
    private readonly subscriptions: ReaderSubscriptionsService,
    private readonly outboxWorker: OutboxWorker,
    private readonly searchIndex: SearchIndexService,
    @Inject(appConfig.KEY) private readonly app: AppConfig,
  ) {}

  async list(claimId: string): Promise<PublicationView[]> {
    const claim = await this.claims.findOrFail(claimId);
    const publications = await this.dataSource.manager.find(Publication, {
      where: { claimId },
      relations: { verdictVersion: true },
      order: { sequence: 'DESC' },
    });
    return publications.map((p) => toPublicationView(p, claim.slug, this.app.appUrl));
  }

  async publish(
    actor: AuthenticatedUser,
    claimId: string,
    dto: PublishClaimDto,
  ): Promise<PublicationView[]> {
    let mails = 0;
    let published = false;
    await this.dataSource.transaction(async (manager) => {
      const claim = await this.claims.lock(manager, claimId);
      if (claim.version !== dto.version) throw ApiError.stale('This claim', claim.version);
      if (claim.status !== 'cleared') {
        throw ApiError.unprocessable('Only a cleared claim can be published', {
          status: claim.status,
        });
      }
      const version = await this.clearedVersion(manager, claimId);
      if (await manager.existsBy(Publication, { claimId, state: 'scheduled' })) {
        throw ApiError.conflict('This claim is already scheduled: cancel that first', {
          publication: 'alreadyScheduled',
        });
      }
      const before = await manager.countBy(Publication, { claimId, state: 'published' });
      if (before > 0 && !dto.note) {
        throw ApiError.unprocessable(
          'An explainer already published changes only with an update note saying what changed',
          { note: 'required' },
        );
      }
      if (before === 0 && dto.note) {
        throw ApiError.unprocessable('A first publication has no update note', {
          note: 'notForFirst',
        });
      }
      const at = dto.at ? new Date(dto.at) : null;
      if (at && !dto.timeZone) {
        throw ApiError.unprocessable('Say which time zone the publication time is in', {
          timeZone: 'required',
        });
      }
      if (at && at.getTime() < Date.now() + MIN_LEAD_MS) {
        throw ApiError.unprocessable('A scheduled time must be at least a minute ahead', {
          at: 'notInFuture',
        });
      }
      const last = await manager.findOne(Publication, {
        where: { claimId },
        order: { sequence: 'DESC' },
      });
      const publication = manager.create(Publication, {
        claimId,
        versionId: version.id,
        sequence: (last?.sequence ?? 0) + 1,
        state: at ? 'scheduled' : 'published',
        scheduledFor: at,
        scheduledTimeZone: at ? dto.timeZone! : null,
        noteKind: dto.note?.kind ?? null,
        noteText: dto.note?.text ?? null,
        createdById: actor.id,
      });
      if (at) {
        await manager.save(publication);
        claim.updatedAt = new Date();
        await manager.save(claim);
        await this.audit.record(manager, {
          actorId: actor.id,
          action: 'claim.scheduled',
          entityType: 'claim',
          entityId: claimId,
          claimId,
          summary: { at: at.toISOString(), timeZone: dto.timeZone, versionNumber: version.number },
        });
        return;
      }
      mails = await this.publishNow(manager, claim, version, publication, actor.id);
      published = true;
    });
    await this.afterPublishing(claimId, published, mails);
    return this.list(claimId);
  }

  /** Withdraws a scheduled publication before it happens; the claim stays cleared. */
  async cancelSchedule(
    actor: AuthenticatedUser,
    claimId: string,
    version: number,
  ): Promise<PublicationView[]> {
    await this.dataSource.transaction(async (manager) => {
      const claim = await this.claims.lock(manager, claimId);
      if (claim.version !== version) throw ApiError.stale('This claim', claim.version);
      const scheduled = await manager.findOne(Publication, {
        where: { claimId, state: 'scheduled' },
        lock: { mode: 'pessimistic_write' },
      });
      if (!scheduled) {
        throw new ApiError(HttpStatus.NOT_FOUND, 'Nothing is scheduled for this claim');
      }
      scheduled.state = 'cancelled';
      await manager.save(scheduled);
      claim.updatedAt = new Date();
      await manager.save(claim);
      await this.audit.record(manager, {
        actorId: actor.id,
        action: 'claim.schedule_cancelled',
        entityType: 'claim',
        entityId: claimId,
        claimId,
        summary: { at: scheduled.scheduledFor?.toISOString() },
      });
    });
    return this.list(claimId);
  }

  /**
   * Publishes every scheduled publication whose time has come. Each is re-checked under
   * the claim's lock, so with several API instances each is published once. A claim that
   * is no longer cleared (sent back, set aside) has its schedule cancelled instead.
   */
  async publishDue(now = new Date()): Promise<number> {
    const due = await this.dataSource.manager.find(Publication, {
      where: { state: 'scheduled', scheduledFor: LessThanOrEqual(now) },
      order: { scheduledFor: 'ASC' },
      take: 50,
    });
    let count = 0;
    for (const { id, claimId } of due) {
      let mails = 0;
      let published = false;
      try {
        await this.dataSource.transaction(async (manager) => {
          const claim = await this.claims.lock(manager, claimId);
          const publication = await manager.findOne(Publication, {
            where: { id, state: 'scheduled' },
            lock: { mode: 'pessimistic_write' },
          });
          if (!publication) return;
          const version = await manager.findOne(VerdictVersion, {
            where: { id: publication.versionId, state: 'cleared' },
          });
          if (claim.status !== 'cleared' || !version) {
            publication.state = 'cancelled';
            await manager.save(publication);
            await this.audit.record(manager, {
              actorId: null,
              action: 'claim.schedule_lapsed',
              entityType: 'claim',
              entityId: claimId,
              claimId,
              summary: { status: claim.status },
            });
            return;
          }
          mails = await this.publishNow(manager, claim, version, publication, null);
          published = true;
        });
      } catch (error) {
        this.logger.error(`scheduled publication ${id} failed: ${String(error)}`);
        continue;
      }
      await this.afterPublishing(claimId, published, mails);
      if (published) count += 1;
    }
    return count;
  }

  private async clearedVersion(manager: EntityManager, claimId: string): Promise<VerdictVersion> {
    const version = await manager.findOne(VerdictVersion, {
      where: { claimId, state: 'cleared' },
      order: { number: 'DESC' },
    });
    if (!version) {
      throw ApiError.unprocessable('The claim has no cleared verdict version to publish', {
        verdict: 'notCleared',
      });
    }
    return version;
  }

  /**
   * Makes one publication public, in the caller's transaction: the claim gets its stable
   * slug, the version becomes the published one (earlier ones superseded), the claim is
   * published, the desk and, for an update, the subscribed readers are mailed.
   */
  private async publishNow(
    manager: EntityManager,
    claim: Claim,
    version: VerdictVersion,
    publication: Publication,
    actorId: string | null,
  ): Promise<number> {
    const { summary } = claimAsCleared(claim, version);
    claim.slug ??= await uniqueSlug(manager, claim.id, summary);
    publication.state = 'published';
    publication.publishedAt = new Date();
    claim.firstPublishedAt ??= publication.publishedAt;
    await manager.save(publication);
    await manager.update(
      VerdictVersion,
      { claimId: claim.id, state: 'published' },
      { state: 'superseded' },
    );
    version.state = 'published';
    await manager.save(version);
    claim.status = 'published';
    await manager.save(claim);
    await this.audit.record(manager, {
      actorId,
      action: 'claim.published',
      entityType: 'claim',
      entityId: claim.id,
      claimId: claim.id,
      summary: {
        sequence: publication.sequence,
        versionNumber: version.number,
        ...(publication.noteKind
          ? { note: { kind: publication.noteKind, text: publication.noteText } }
          : {}),
        ...(publication.scheduledFor ? { scheduled: true } : {}),
      },
    });

    const url = explainerUrl(this.app.appUrl, claim.slug);
    const team = await manager.findBy(User, {
      id: In([
        version.createdById,
        version.lastEditedById,
        claim.assigneeId ?? version.createdById,
      ]),
    });
    let mails = await this.notifications.notify(manager, 'published', team, (recipient) =>
      publishedMail({ displayName: recipient.displayName, summary, url }),
    );
    if (publication.scheduledFor) {
      const scheduler = await manager.findBy(User, { id: publication.createdById });
      mails += await this.notifications.notify(
        manager,
        'scheduled_published',
        scheduler,
        (recipient) =>
          scheduledPublishedMail({
            displayName: recipient.displayName,
            summary,
            url,
            at: publication.scheduledFor!,
            timeZone: publication.scheduledTimeZone ?? 'UTC',
          }),
      );
    }
    if (publication.noteKind) {
      mails += await this.subscriptions.notifyUpdate(manager, claim, {
        summary,
        kindLabel: updateNoteKindLabels[publication.noteKind],
        text: publication.noteText ?? '',
        url,
      });
    }
    return mails;
  }

  private async afterPublishing(claimId: string, published: boolean, mails: number) {
    if (mails > 0) this.outboxWorker.nudge();
    await this.searchIndex.claimsChanged([claimId]);
    if (published) await this.searchIndex.explainersChanged([claimId]);
  }
}
