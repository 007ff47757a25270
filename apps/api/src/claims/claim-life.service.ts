import { Injectable } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import {
  claimStatusLabels,
  openClaimStatuses,
  type ClaimDetail,
  type ClaimStatus,
  type Role,
} from '@skyledger/contracts';
import { DataSource } from 'typeorm';
import { AuditService } from '../audit/audit.service';
import { type AuthenticatedUser } from '../auth/authenticated-user';
import { ApiError } from '../common/errors/api-error';
import { SearchIndexService } from '../search/search-index.service';
import { forbidden } from './claim-policy';
import { ClaimsService } from './claims.service';
import { type ClaimTransitionDto } from './dto/claim-transition.dto';
import { type Claim } from './entities/claim.entity';

interface Transition {
  from: readonly ClaimStatus[];
  roles: readonly Role[];
  /** Checks the request carries what this move needs and applies it to the claim. */
  apply(claim: Claim, dto: ClaimTransitionDto): void;
}

/**
 * The claim life as one table of moves. Taking a filed claim into research happens by
 * assignment (ClaimAssignmentService); the sign-off and publishing moves join this
 * table with the verdicts.
 */
const transitions: Partial<Record<ClaimStatus, Transition>> = {
  set_aside: {
    from: openClaimStatuses,
    roles: ['desk_chief'],
    apply(claim, dto) {
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
};

@Injectable()
export class ClaimLifeService {
  constructor(
    @InjectDataSource() private readonly dataSource: DataSource,
    private readonly claims: ClaimsService,
    private readonly audit: AuditService,
    private readonly searchIndex: SearchIndexService,
  ) {}

  async transition(
    actor: AuthenticatedUser,
    id: string,
    dto: ClaimTransitionDto,
  ): Promise<ClaimDetail> {
    await this.dataSource.transaction(async (manager) => {
      const claim = await this.claims.lock(manager, id);
      if (claim.version !== dto.version) throw ApiError.stale('This claim', claim.version);
      const move = transitions[dto.to];
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
      move.apply(claim, dto);
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
    await this.searchIndex.claimsChanged([id]);
    return this.claims.detail(id);
  }
}
