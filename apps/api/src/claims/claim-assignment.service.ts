import { Inject, Injectable } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import { roleLabels, type ClaimDetail } from '@skyledger/contracts';
import { DataSource } from 'typeorm';
import { AuditService } from '../audit/audit.service';
import { type AuthenticatedUser } from '../auth/authenticated-user';
import { ApiError } from '../common/errors/api-error';
import { appConfig, type AppConfig } from '../config/configuration';
import { NotificationsService } from '../mail/notifications.service';
import { OutboxWorker } from '../mail/outbox.worker';
import { claimAssignedMail } from '../mail/templates/claim-assigned.mail';
import { SearchIndexService } from '../search/search-index.service';
import { User } from '../users/entities/user.entity';
import { claimRoles, forbidden, hasRole } from './claim-policy';
import { ClaimsService } from './claims.service';
import { type AssignClaimDto } from './dto/assign-claim.dto';

/**
 * Who researches a claim. A science editor takes an unassigned claim for themself; only a
 * desk chief gives one to someone else or takes it off them. A filed claim moves into
 * research when someone takes it, in the same transaction.
 */
@Injectable()
export class ClaimAssignmentService {
  constructor(
    @InjectDataSource() private readonly dataSource: DataSource,
    private readonly claims: ClaimsService,
    private readonly audit: AuditService,
    private readonly notifications: NotificationsService,
    private readonly outboxWorker: OutboxWorker,
    private readonly searchIndex: SearchIndexService,
    @Inject(appConfig.KEY) private readonly app: AppConfig,
  ) {}

  async assign(actor: AuthenticatedUser, id: string, dto: AssignClaimDto): Promise<ClaimDetail> {
    let mailed = false;
    await this.dataSource.transaction(async (manager) => {
      const claim = await this.claims.lock(manager, id);
      if (claim.version !== dto.version) throw ApiError.stale('This claim', claim.version);
      this.assertMayAssign(actor, claim.assigneeId, dto.assigneeId);
      if (claim.status === 'published' || claim.status === 'set_aside') {
        throw ApiError.unprocessable('This claim is no longer being researched', {
          status: claim.status,
        });
      }
      if (dto.assigneeId === claim.assigneeId) return;

      const assignee = dto.assigneeId
        ? await manager.findOne(User, { where: { id: dto.assigneeId } })
        : null;
      if (dto.assigneeId && !assignee) {
        throw ApiError.unprocessable('No such person on the desk', { assigneeId: 'notFound' });
      }
      if (assignee && (assignee.status !== 'active' || !hasRole(assignee, claimRoles.assignable))) {
        throw ApiError.unprocessable(
          `${assignee.displayName} cannot research claims (${roleLabels[assignee.role].toLowerCase()}, ${assignee.status}); choose an active science editor or desk chief`,
          { assigneeId: 'notAssignable' },
        );
      }
      const from = { assigneeId: claim.assigneeId, status: claim.status };
      claim.assigneeId = assignee?.id ?? null;
      if (assignee && claim.status === 'filed') claim.status = 'in_research';
      await manager.save(claim);
      await this.audit.record(manager, {
        actorId: actor.id,
        action: assignee ? 'claim.assigned' : 'claim.unassigned',
        entityType: 'claim',
        entityId: claim.id,
        claimId: claim.id,
        summary: {
          assignee: { from: from.assigneeId, to: claim.assigneeId },
          ...(from.status !== claim.status
            ? { status: { from: from.status, to: claim.status } }
            : {}),
          ...(assignee ? { assigneeName: assignee.displayName } : {}),
        },
      });
      if (assignee && assignee.id !== actor.id) {
        const queued = await this.notifications.notify(manager, 'claim_assigned', [assignee], () =>
          claimAssignedMail({
            displayName: assignee.displayName,
            assignedBy: actor.displayName,
            summary: claim.summary,
            url: `${this.app.appUrl}/claims/${claim.id}`,
          }),
        );
        mailed = queued > 0;
      }
    });
    if (mailed) this.outboxWorker.nudge();
    await this.searchIndex.claimsChanged([id]);
    return this.claims.detail(id);
  }

  private assertMayAssign(
    actor: AuthenticatedUser,
    current: string | null,
    next: string | null,
  ): void {
    if (actor.role === 'desk_chief') return;
    if (actor.role !== 'science_editor') {
      throw forbidden('Only science editors take claims, and only a desk chief assigns them');
    }
    if (next !== actor.id) {
      throw forbidden('A science editor may only take a claim; a desk chief assigns it to others');
    }
    if (current !== null && current !== actor.id) {
      throw ApiError.conflict('Someone else has this claim; ask the desk chief to reassign it', {
        assigneeId: 'taken',
      });
    }
  }
}
