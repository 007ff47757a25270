import { HttpStatus, Injectable } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import { type ClaimVerdictView, type VerdictVersionView } from '@skyledger/contracts';
import { explainerTemplate, type ExplainerDocument } from '@skyledger/explainer';
import { DataSource, type EntityManager } from 'typeorm';
import { AuditService } from '../audit/audit.service';
import { type AuthenticatedUser } from '../auth/authenticated-user';
import { claimantForReaders } from '../claimants/claimant-view';
import { Claimant } from '../claimants/entities/claimant.entity';
import { claimRoles } from '../claims/claim-policy';
import { ClaimsService } from '../claims/claims.service';
import { type Claim } from '../claims/entities/claim.entity';
import { ApiError } from '../common/errors/api-error';
import { RatingLevel } from '../ratings/entities/rating-level.entity';
import { ClaimSource } from '../sources/entities/claim-source.entity';
import { type UpdateVerdictVersionDto } from './dto/update-verdict-version.dto';
import { type VerdictFieldsDto } from './dto/verdict-fields.dto';
import { SignoffDecisionRecord } from './entities/signoff-decision.entity';
import { VerdictConflict } from './entities/verdict-conflict.entity';
import { VerdictVersion } from './entities/verdict-version.entity';
import { prepareExplainerBody } from './verdict-body';
import { toVerdictConflictView, toVerdictVersionView } from './verdict-views';

const versionRelations = { createdBy: true, lastEditedBy: true, claimant: true } as const;

/** A save refused for its stale version, carrying what it tried to save. */
class StaleDraftSave extends Error {
  constructor(readonly currentVersion: number) {
    super('stale');
  }
}

/** A claim's verdict, version by version: drafts are edited, submitted ones are frozen. */
@Injectable()
export class VerdictsService {
  constructor(
    @InjectDataSource() private readonly dataSource: DataSource,
    private readonly claims: ClaimsService,
    private readonly audit: AuditService,
  ) {}

  async view(claimId: string): Promise<ClaimVerdictView> {
    await this.claims.findOrFail(claimId);
    const manager = this.dataSource.manager;
    const [versions, decisions, conflicts] = await Promise.all([
      manager.find(VerdictVersion, {
        where: { claimId },
        relations: versionRelations,
        order: { number: 'DESC' },
      }),
      manager.find(SignoffDecisionRecord, {
        where: { claimId },
        relations: { decidedBy: true },
        order: { at: 'ASC' },
      }),
      manager.find(VerdictConflict, {
        where: { claimId },
        relations: { savedBy: true },
        order: { at: 'DESC' },
      }),
    ]);
    return {
      versions: versions.map((version) => toVerdictVersionView(version, decisions)),
      conflicts: conflicts.map(toVerdictConflictView),
    };
  }

  async versionView(id: string): Promise<VerdictVersionView> {
    const manager = this.dataSource.manager;
    const version = await manager.findOneOrFail(VerdictVersion, {
      where: { id },
      relations: versionRelations,
    });
    const decisions = await manager.find(SignoffDecisionRecord, {
      where: { versionId: id },
      relations: { decidedBy: true },
      order: { at: 'ASC' },
    });
    return toVerdictVersionView(version, decisions);
  }

  /**
   * Starts a new draft: from what is sent, else from the latest version, else from the
   * template (fact first). A claim sent back goes back into research with it.
   */
  async createDraft(
    actor: AuthenticatedUser,
    claimId: string,
    dto: VerdictFieldsDto,
  ): Promise<VerdictVersionView> {
    const id = await this.dataSource.transaction(async (manager) => {
      const claim = await this.claims.lockForContribution(
        manager,
        claimId,
        actor,
        claimRoles.research,
      );
      if (claim.status !== 'in_research' && claim.status !== 'sent_back') {
        throw ApiError.unprocessable('A verdict is drafted while the claim is in research', {
          status: claim.status,
        });
      }
      const latest = await manager.findOne(VerdictVersion, {
        where: { claimId },
        order: { number: 'DESC' },
      });
      if (latest?.state === 'draft') {
        throw ApiError.conflict('This claim already has a draft verdict: edit that one', {
          verdict: 'draftExists',
        });
      }
      await this.checkRating(manager, dto.ratingId);
      await this.checkPrimarySource(manager, claimId, dto.primarySourceId);
      const { body, bodyHtml } = await prepareExplainerBody(
        manager,
        claimId,
        dto.body ?? latest?.body ?? (await this.template(manager, claim)),
      );
      const version = await manager.save(
        manager.create(VerdictVersion, {
          claimId,
          number: (latest?.number ?? 0) + 1,
          state: 'draft',
          ratingId: dto.ratingId !== undefined ? dto.ratingId : (latest?.ratingId ?? null),
          bottomLine: dto.bottomLine ?? latest?.bottomLine ?? '',
          body,
          bodyHtml,
          primarySourceId:
            dto.primarySourceId !== undefined
              ? dto.primarySourceId
              : (latest?.primarySourceId ?? null),
          createdById: actor.id,
          lastEditedById: actor.id,
        }),
      );
      await this.audit.record(manager, {
        actorId: actor.id,
        action: 'verdict.drafted',
        entityType: 'verdict_version',
        entityId: version.id,
        claimId,
        summary: { number: version.number, ratingId: version.ratingId },
      });
      if (claim.status === 'sent_back') await this.backToResearch(manager, actor, claim);
      return version.id;
    });
    return this.versionView(id);
  }

  /**
   * Saves a draft. A save with a stale version is refused (409) and kept as a conflict,
   * so neither editor's words are lost.
   */
  async updateDraft(
    actor: AuthenticatedUser,
    claimId: string,
    versionId: string,
    dto: UpdateVerdictVersionDto,
  ): Promise<VerdictVersionView> {
    try {
      await this.dataSource.transaction(async (manager) => {
        await this.claims.lockForContribution(manager, claimId, actor, claimRoles.research);
        const version = await manager.findOne(VerdictVersion, {
          where: { id: versionId, claimId },
          lock: { mode: 'pessimistic_write' },
        });
        if (!version)
          throw new ApiError(HttpStatus.NOT_FOUND, 'No such verdict version on this claim');
        if (version.version !== dto.version) throw new StaleDraftSave(version.version);
        if (version.state !== 'draft') {
          throw ApiError.unprocessable(
            'This version was submitted and is frozen; start a new version to change it',
            { state: version.state },
          );
        }
        const changed: string[] = [];
        if (dto.ratingId !== undefined && dto.ratingId !== version.ratingId) {
          await this.checkRating(manager, dto.ratingId);
          version.ratingId = dto.ratingId;
          changed.push('rating');
        }
        if (dto.primarySourceId !== undefined && dto.primarySourceId !== version.primarySourceId) {
          await this.checkPrimarySource(manager, claimId, dto.primarySourceId);
          version.primarySourceId = dto.primarySourceId;
          changed.push('primarySource');
        }
        if (dto.bottomLine !== undefined && dto.bottomLine !== version.bottomLine) {
          version.bottomLine = dto.bottomLine;
          changed.push('bottomLine');
        }
        if (dto.body !== undefined) {
          const prepared = await prepareExplainerBody(manager, claimId, dto.body);
          if (JSON.stringify(prepared.body) !== JSON.stringify(version.body)) {
            Object.assign(version, prepared);
            changed.push('body');
          }
        }
        if (changed.length === 0) return;
        version.lastEditedById = actor.id;
        await manager.save(version);
        await this.audit.record(manager, {
          actorId: actor.id,
          action: 'verdict.edited',
          entityType: 'verdict_version',
          entityId: version.id,
          claimId,
          summary: { number: version.number, changed, ratingId: version.ratingId },
        });
      });
    } catch (error) {
      if (!(error instanceof StaleDraftSave)) throw error;
      await this.dataSource.manager.insert(VerdictConflict, {
        claimId,
        versionId,
        savedById: actor.id,
        ratingId: dto.ratingId ?? null,
        bottomLine: dto.bottomLine ?? null,
        body: (dto.body as ExplainerDocument | undefined) ?? null,
      });
      throw ApiError.stale('This draft', error.currentVersion);
    }
    return this.versionView(versionId);
  }

  /** Records the desk chief's waiver of the right of reply, with the reason. */
  async waiveReply(
    actor: AuthenticatedUser,
    claimId: string,
    reason: string,
    claimVersion: number,
  ): Promise<void> {
    await this.dataSource.transaction(async (manager) => {
      const claim = await this.claims.lock(manager, claimId);
      if (claim.version !== claimVersion) throw ApiError.stale('This claim', claim.version);
      claim.replyWaiverReason = reason;
      claim.replyWaivedById = actor.id;
      claim.replyWaivedAt = new Date();
      await manager.save(claim);
      await this.audit.record(manager, {
        actorId: actor.id,
        action: 'claim.reply_waived',
        entityType: 'claim',
        entityId: claimId,
        claimId,
        summary: { reason },
      });
    });
  }

  private async backToResearch(manager: EntityManager, actor: AuthenticatedUser, claim: Claim) {
    claim.status = 'in_research';
    await manager.save(claim);
    await this.audit.record(manager, {
      actorId: actor.id,
      action: 'claim.in_research',
      entityType: 'claim',
      entityId: claim.id,
      claimId: claim.id,
      summary: { status: { from: 'sent_back', to: 'in_research' } },
    });
  }

  private async template(manager: EntityManager, claim: Claim): Promise<ExplainerDocument> {
    const claimant = await manager.findOneByOrFail(Claimant, { id: claim.claimantId });
    return explainerTemplate({
      text: claim.text,
      claimantName: claimantForReaders(claimant).displayName,
    });
  }

  private async checkRating(manager: EntityManager, ratingId: string | null | undefined) {
    if (ratingId && !(await manager.existsBy(RatingLevel, { id: ratingId }))) {
      throw ApiError.unprocessable('There is no such level on the rating scale', {
        ratingId: 'unknownRating',
      });
    }
  }

  private async checkPrimarySource(
    manager: EntityManager,
    claimId: string,
    sourceId: string | null | undefined,
  ) {
    if (sourceId && !(await manager.existsBy(ClaimSource, { claimId, sourceId }))) {
      throw ApiError.unprocessable('The primary source must be one of the claim’s sources', {
        primarySourceId: 'notOnClaim',
      });
    }
  }
}
