import { HttpStatus, Inject, Injectable } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import {
  claimStatusLabels,
  openClaimStatuses,
  type ClaimDetail,
  type ClaimStatus,
  type Role,
} from '@skyledger/contracts';
import { DataSource, In, type EntityManager } from 'typeorm';
import { AuditService } from '../audit/audit.service';
import { type AuthenticatedUser } from '../auth/authenticated-user';
import { forbidden } from '../claims/claim-policy';
import { ClaimsService } from '../claims/claims.service';
import { type ClaimTransitionDto } from '../claims/dto/claim-transition.dto';
import { type Claim } from '../claims/entities/claim.entity';
import { ApiError } from '../common/errors/api-error';
import { appConfig, type AppConfig } from '../config/configuration';
import { NotificationsService } from '../mail/notifications.service';
import { OutboxWorker } from '../mail/outbox.worker';
import { clearedMail, sentBackMail, signoffRequestedMail } from '../mail/templates/signoff.mails';
import { SearchIndexService } from '../search/search-index.service';
import { User } from '../users/entities/user.entity';
import { claimAsItStands } from '../verdicts/claim-as-cleared';
import { SignoffDecisionRecord } from '../verdicts/entities/signoff-decision.entity';
import { VerdictVersion } from '../verdicts/entities/verdict-version.entity';
import { signoffChecklist } from '../verdicts/signoff-checklist';
import { twoPersonRuleRefusal } from '../verdicts/two-person-rule';

/** What a move may use: the locked claim, the request, who asks, and the transaction. */
interface MoveContext {
  manager: EntityManager;
  claim: Claim;
  actor: AuthenticatedUser;
  dto: ClaimTransitionDto;
  /** Counts mails queued, so the worker is nudged after commit. */
  queued: { count: number };
}

interface Move {
  from: readonly ClaimStatus[];
  roles: readonly Role[];
  /** Checks what this move needs and does its part, before the status changes. */
  run(context: MoveContext): Promise<void>;
}

/**
 * The claim life as one table of moves, each run in one transaction with its audit event
 * and its mails. Taking a filed claim into research happens by assignment
 * (ClaimAssignmentService); publishing joins with the publishing issue.
 */
@Injectable()
export class ClaimLifeService {
  private readonly moves: Partial<Record<ClaimStatus, Move>> = {
    set_aside: {
      from: openClaimStatuses,
      roles: ['desk_chief'],
      run: async ({ claim, dto }) => {
        if (!dto.reason) {
          throw ApiError.unprocessable(
            'Say why the claim is set aside: duplicate, not checkable or out of scope',
            { reason: 'required' },
          );
        }
        claim.setAsideReason = dto.reason;
        claim.setAsideNote = dto.note ?? null;
      },
    },
    awaiting_signoff: {
      from: ['in_research'],
      roles: ['science_editor', 'desk_chief'],
      run: (context) => this.submit(context),
    },
    sent_back: {
      from: ['awaiting_signoff'],
      roles: ['copy_desk', 'desk_chief'],
      run: (context) => this.sendBack(context),
    },
    cleared: {
      from: ['awaiting_signoff'],
      roles: ['copy_desk', 'desk_chief'],
      run: (context) => this.clear(context),
    },
    // Back into research: after a send-back, or to correct a published explainer (its
    // page stays as published until the corrected version is cleared and published).
    in_research: {
      from: ['sent_back', 'published'],
      roles: ['science_editor', 'desk_chief'],
      run: () => Promise.resolve(),
    },
  };

  constructor(
    @InjectDataSource() private readonly dataSource: DataSource,
    private readonly claims: ClaimsService,
    private readonly audit: AuditService,
    private readonly notifications: NotificationsService,
    private readonly outboxWorker: OutboxWorker,
    private readonly searchIndex: SearchIndexService,
    @Inject(appConfig.KEY) private readonly app: AppConfig,
  ) {}

  async transition(
    actor: AuthenticatedUser,
    id: string,
    dto: ClaimTransitionDto,
  ): Promise<ClaimDetail> {
    const queued = { count: 0 };
    await this.dataSource.transaction(async (manager) => {
      const claim = await this.claims.lock(manager, id);
      if (claim.version !== dto.version) throw ApiError.stale('This claim', claim.version);
      const move = this.moves[dto.to];
      if (!move) {
        throw ApiError.unprocessable(
          `A claim cannot be moved to “${claimStatusLabels[dto.to]}” this way`,
          { to: 'notAllowed' },
        );
      }
      if (!move.roles.includes(actor.role)) {
        throw forbidden(`Your role may not move a claim to “${claimStatusLabels[dto.to]}”`);
      }
      if (!move.from.includes(claim.status)) {
        throw ApiError.unprocessable(
          `A claim that is “${claimStatusLabels[claim.status]}” cannot move to “${claimStatusLabels[dto.to]}”`,
          { to: 'notFromHere' },
        );
      }
      const from = claim.status;
      await move.run({ manager, claim, actor, dto, queued });
      claim.status = dto.to;
      await manager.save(claim);
      await this.audit.record(manager, {
        actorId: actor.id,
        action: `claim.${dto.to}`,
        entityType: 'claim',
        entityId: id,
        claimId: id,
        summary: {
          status: { from, to: dto.to },
          ...(dto.reason ? { reason: dto.reason } : {}),
          ...(dto.note ? { note: dto.note } : {}),
        },
      });
    });
    if (queued.count > 0) this.outboxWorker.nudge();
    await this.searchIndex.claimsChanged([id]);
    return this.claims.detail(id);
  }

  /** Freezes the draft and asks the copy desk to sign it off. */
  private async submit({ manager, claim, actor, queued }: MoveContext): Promise<void> {
    if (actor.role === 'science_editor' && claim.assigneeId !== actor.id) {
      throw forbidden(
        'Only the science editor researching this claim, or a desk chief, submits it',
      );
    }
    const draft = await manager.findOne(VerdictVersion, {
      where: { claimId: claim.id, state: 'draft' },
      lock: { mode: 'pessimistic_write' },
    });
    if (!draft) {
      throw ApiError.unprocessable('Draft a verdict before submitting it for sign-off', {
        verdict: 'required',
      });
    }
    const [complete] = await signoffChecklist(manager, claim, draft);
    if (!complete!.done) {
      throw ApiError.unprocessable(complete!.detail, { verdict: 'incomplete' });
    }
    draft.state = 'submitted';
    draft.submittedAt = new Date();
    await manager.save(draft);
    const copyDesk = await manager.find(User, { where: { role: 'copy_desk', status: 'active' } });
    queued.count += await this.notifications.notify(
      manager,
      'signoff_requested',
      copyDesk,
      (recipient) =>
        signoffRequestedMail({
          displayName: recipient.displayName,
          by: actor.displayName,
          number: draft.number,
          summary: claim.summary,
          url: `${this.app.appUrl}/claims/${claim.id}/signoff`,
        }),
    );
  }

  private async sendBack(context: MoveContext): Promise<void> {
    const { manager, claim, actor, dto, queued } = context;
    if (!dto.note?.trim()) {
      throw ApiError.unprocessable('Say what needs changing: the notes go to the author', {
        note: 'required',
      });
    }
    const version = await this.decide(context, 'sent_back');
    const authors = await manager.findBy(User, {
      id: In([version.createdById, version.lastEditedById]),
    });
    queued.count += await this.notifications.notify(manager, 'sent_back', authors, (recipient) =>
      sentBackMail({
        displayName: recipient.displayName,
        by: actor.displayName,
        number: version.number,
        notes: dto.note!,
        summary: claim.summary,
        url: `${this.app.appUrl}/claims/${claim.id}`,
      }),
    );
  }

  private async clear(context: MoveContext): Promise<void> {
    const { manager, claim, actor, queued } = context;
    const version = await this.decide(context, 'cleared');
    const authors = await manager.findBy(User, {
      id: In([version.createdById, version.lastEditedById]),
    });
    queued.count += await this.notifications.notify(manager, 'cleared', authors, (recipient) =>
      clearedMail({
        displayName: recipient.displayName,
        by: actor.displayName,
        number: version.number,
        summary: claim.summary,
        url: `${this.app.appUrl}/claims/${claim.id}`,
      }),
    );
  }

  /**
   * The copy desk's decision on the submitted version, under the two-person rule; clearing
   * also needs every checklist item done. Keeps the decision with the checklist as it stood.
   */
  private async decide(
    { manager, claim, actor, dto }: MoveContext,
    decision: 'cleared' | 'sent_back',
  ): Promise<VerdictVersion> {
    const version = await manager.findOne(VerdictVersion, {
      where: { claimId: claim.id, state: 'submitted' },
      lock: { mode: 'pessimistic_write' },
    });
    if (!version) {
      throw new ApiError(HttpStatus.CONFLICT, 'No verdict version is waiting for sign-off', {
        verdict: 'notSubmitted',
      });
    }
    const refusal = twoPersonRuleRefusal(actor, version);
    if (refusal) throw forbidden(refusal);
    const checklist = await signoffChecklist(manager, claim, version);
    const open = checklist.filter((entry) => !entry.done);
    if (decision === 'cleared' && open.length > 0) {
      throw ApiError.unprocessable(
        `Not cleared: ${open.map((entry) => `${entry.label.toLowerCase()} (${entry.detail})`).join('; ')}`,
        Object.fromEntries(open.map((entry) => [`checklist.${entry.key}`, 'open'])),
      );
    }
    version.state = decision;
    // The claim as the copy desk saw it (the transition checked the claim's version).
    if (decision === 'cleared') Object.assign(version, await claimAsItStands(manager, claim));
    await manager.save(version);
    await manager.insert(SignoffDecisionRecord, {
      claimId: claim.id,
      versionId: version.id,
      decision,
      notes: dto.note?.trim() || null,
      decidedById: actor.id,
      checklist,
    });
    return version;
  }
}
