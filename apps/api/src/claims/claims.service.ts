import { Injectable } from '@nestjs/common';
import { InjectDataSource, InjectRepository } from '@nestjs/typeorm';
import {
  CLAIM_PAGE_SIZE_DEFAULT,
  type ClaimDetail,
  type ClaimHistoryEvent,
  type ClaimQueueResponse,
  type Role,
} from '@skyledger/contracts';
import { DataSource, In, Repository, type EntityManager } from 'typeorm';
import { Appearance } from '../appearances/entities/appearance.entity';
import { AuditService } from '../audit/audit.service';
import { applyChanges } from '../audit/changes';
import { AuditEvent } from '../audit/entities/audit-event.entity';
import { type AuthenticatedUser } from '../auth/authenticated-user';
import { ClaimantsService } from '../claimants/claimants.service';
import { ApiError } from '../common/errors/api-error';
import { assertExactlyOne } from '../common/validation/exactly-one';
import { SearchIndexService } from '../search/search-index.service';
import { User } from '../users/entities/user.entity';
import { ClaimDetailsReader } from './claim-details.reader';
import { ClaimStatusCounts } from './claim-status-counts';
import { claimNotFound } from './claim-not-found';
import { assertMayEditClaim, claimRoles, forbidden, hasRole } from './claim-policy';
import { queuePage, toQueueItem, type QueueRow } from './claim-queue';
import { toClaimHistoryEvent } from './claim-views';
import { type CreateClaimDto } from './dto/create-claim.dto';
import { type ClaimQueueQueryDto } from './dto/claim-queue-query.dto';
import { type UpdateClaimDto } from './dto/update-claim.dto';
import { ClaimTopic } from './entities/claim-topic.entity';
import { Claim } from './entities/claim.entity';

@Injectable()
export class ClaimsService {
  constructor(
    @InjectRepository(Claim) private readonly claims: Repository<Claim>,
    @InjectDataSource() private readonly dataSource: DataSource,
    private readonly audit: AuditService,
    private readonly claimants: ClaimantsService,
    private readonly details: ClaimDetailsReader,
    private readonly searchIndex: SearchIndexService,
    private readonly statusCounts: ClaimStatusCounts,
  ) {}

  async file(actor: AuthenticatedUser, dto: CreateClaimDto): Promise<ClaimDetail> {
    assertExactlyOne(
      dto,
      'claimantId',
      'claimant',
      'Pick a claimant or describe a new one (one of the two)',
    );
    const id = await this.dataSource.transaction(async (manager) => {
      const claimant = dto.claimant
        ? await this.claimants.createIn(manager, actor, dto.claimant)
        : await this.claimants.findIn(manager, dto.claimantId!, 'claimantId');
      const claim = await manager.save(
        manager.create(Claim, {
          text: dto.text,
          summary: dto.summary,
          legalReview: dto.legalReview ?? false,
          claimantId: claimant.id,
          filedById: actor.id,
          status: 'filed',
        }),
      );
      await this.saveTopics(manager, claim.id, dto.topics);
      await this.audit.record(manager, {
        actorId: actor.id,
        action: 'claim.filed',
        entityType: 'claim',
        entityId: claim.id,
        claimId: claim.id,
        summary: { summary: dto.summary, claimant: claimant.name, topics: dto.topics },
      });
      if (dto.firstAppearance) {
        const { seenAt, ...rest } = dto.firstAppearance;
        const appearance = await manager.save(
          manager.create(Appearance, {
            ...rest,
            seenAt: new Date(seenAt),
            isFirstKnown: true,
            claimId: claim.id,
            createdById: actor.id,
          }),
        );
        await this.audit.record(manager, {
          actorId: actor.id,
          action: 'appearance.added',
          entityType: 'appearance',
          entityId: appearance.id,
          claimId: claim.id,
          summary: { url: appearance.url, outlet: appearance.outlet, isFirstKnown: true },
        });
      }
      return claim.id;
    });
    await this.searchIndex.claimsChanged([id]);
    return this.detail(id);
  }

  async queue(actor: AuthenticatedUser, query: ClaimQueueQueryDto): Promise<ClaimQueueResponse> {
    const pageSize = query.pageSize ?? CLAIM_PAGE_SIZE_DEFAULT;
    const page = query.page ?? 1;
    const [rows, counts] = await Promise.all([
      queuePage(this.claims, query, actor).getRawMany<QueueRow>(),
      this.statusCounts.counts(query, actor),
    ]);
    const total = query.status
      ? counts[query.status]
      : Object.values(counts).reduce((sum, count) => sum + count, 0);
    const items = rows.map(toQueueItem);
    return { items, total, page, pageSize, counts };
  }

  detail(id: string): Promise<ClaimDetail> {
    return this.details.read(id);
  }

  async update(actor: AuthenticatedUser, id: string, dto: UpdateClaimDto): Promise<ClaimDetail> {
    await this.dataSource.transaction(async (manager) => {
      const claim = await this.lock(manager, id);
      if (claim.version !== dto.version) throw ApiError.stale('This claim', claim.version);
      assertMayEditClaim(actor, claim);
      if (dto.legalReview === false && claim.legalReview && actor.role !== 'desk_chief') {
        throw forbidden('Only a desk chief may clear the legal-review flag');
      }
      const { topics, claimantId, version: _version, ...fields } = dto;
      const changes = applyChanges(claim, fields);
      if (claimantId !== undefined && claimantId !== claim.claimantId) {
        const claimant = await this.claimants.findIn(manager, claimantId, 'claimantId');
        changes.claimant = { from: claim.claimantId, to: claimant.id };
        claim.claimantId = claimant.id;
      }
      if (topics !== undefined) {
        const current = await manager.findBy(ClaimTopic, { claimId: id });
        const before = current.map((topic) => topic.topic).sort();
        const after = [...topics].sort();
        if (before.join() !== after.join()) {
          await manager.delete(ClaimTopic, { claimId: id });
          await this.saveTopics(manager, id, topics);
          changes.topics = { from: before, to: after };
        }
      }
      if (Object.keys(changes).length === 0) return;
      // Bumps the version and updated_at even when only the topics changed.
      claim.updatedAt = new Date();
      await manager.save(claim);
      await this.audit.record(manager, {
        actorId: actor.id,
        action: 'claim.updated',
        entityType: 'claim',
        entityId: id,
        claimId: id,
        summary: changes,
      });
    });
    await this.searchIndex.claimsChanged([id]);
    return this.detail(id);
  }

  async history(id: string): Promise<ClaimHistoryEvent[]> {
    await this.findOrFail(id);
    const sourceIds = await this.dataSource
      .createQueryBuilder()
      .select('cs.source_id', 'id')
      .from('claim_sources', 'cs')
      .where('cs.claim_id = :id', { id })
      .getRawMany<{ id: string }>();
    const query = this.dataSource
      .getRepository(AuditEvent)
      .createQueryBuilder('event')
      .where('event.claimId = :id', { id });
    if (sourceIds.length) {
      // A source edit is recorded once, for the source: it shows in every claim citing it.
      query.orWhere('(event.entityType = :source AND event.entityId IN (:...sourceIds))', {
        source: 'source',
        sourceIds: sourceIds.map((row) => row.id),
      });
    }
    const events = await query.orderBy('event.at', 'ASC').addOrderBy('event.id', 'ASC').getMany();
    const actorIds = [
      ...new Set(events.flatMap((event) => (event.actorId ? [event.actorId] : []))),
    ];
    const actors = actorIds.length
      ? await this.dataSource.getRepository(User).findBy({ id: In(actorIds) })
      : [];
    const byId = new Map(actors.map((user) => [user.id, user]));
    return events.map((event) =>
      toClaimHistoryEvent(event, event.actorId ? byId.get(event.actorId) : undefined),
    );
  }

  async findOrFail(id: string): Promise<Claim> {
    const claim = await this.claims.findOne({ where: { id } });
    if (!claim) throw claimNotFound();
    return claim;
  }

  /** Loads a claim inside a transaction with a write lock, so concurrent changes queue up. */
  async lock(manager: EntityManager, id: string): Promise<Claim> {
    const claim = await manager.findOne(Claim, {
      where: { id },
      lock: { mode: 'pessimistic_write' },
    });
    if (!claim) throw claimNotFound();
    return claim;
  }

  /**
   * For changes to a claim's parts (appearances, sources, files, ...): the claim, locked,
   * when the actor's role may add to it; 404 when there is no such claim, 403 otherwise.
   */
  async lockForContribution(
    manager: EntityManager,
    claimId: string,
    actor: AuthenticatedUser,
    allowed: readonly Role[] = claimRoles.contribute,
  ): Promise<Claim> {
    const claim = await this.lock(manager, claimId);
    if (!hasRole(actor, allowed)) {
      throw forbidden('Your role may read this claim but not add to it');
    }
    return claim;
  }

  private async saveTopics(manager: EntityManager, claimId: string, topics: string[]) {
    if (topics.length === 0) return;
    await manager.insert(
      ClaimTopic,
      topics.map((topic) => ({ claimId, topic })),
    );
  }
}
