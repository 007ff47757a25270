import { Body, Controller, Get, HttpCode, HttpStatus, Patch, Post, Query } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import {
  type ClaimDetail,
  type ClaimHistoryEvent,
  type ClaimQueueResponse,
  type SimilarClaim,
} from '@skyledger/contracts';
import { type AuthenticatedUser } from '../auth/authenticated-user';
import { CurrentUser } from '../common/decorators/current-user.decorator';
import { Roles } from '../common/decorators/roles.decorator';
import { UuidParam } from '../common/decorators/uuid-param.decorator';
import { SimilarClaimsQueryDto } from '../search/dto/similar-claims-query.dto';
import { SearchService } from '../search/search.service';
import { ClaimAssignmentService } from './claim-assignment.service';
import { claimRoles } from './claim-policy';
import { ClaimsService } from './claims.service';
import { AssignClaimDto } from './dto/assign-claim.dto';
import { ClaimQueueQueryDto } from './dto/claim-queue-query.dto';
import { CreateClaimDto } from './dto/create-claim.dto';
import { UpdateClaimDto } from './dto/update-claim.dto';

/** The claims desk: filing, the queue, the claim page, assignment and the claim life. */
@ApiTags('claims')
@ApiBearerAuth()
@Controller('claims')
export class ClaimsController {
  constructor(
    private readonly claims: ClaimsService,
    private readonly assignment: ClaimAssignmentService,
    private readonly search: SearchService,
  ) {}

  /** Files a claim, with a new or existing claimant and optionally its first appearance. */
  @Post()
  @Roles(...claimRoles.contribute)
  file(@CurrentUser() actor: AuthenticatedUser, @Body() dto: CreateClaimDto): Promise<ClaimDetail> {
    return this.claims.file(actor, dto);
  }

  /** The queue: filtered, sorted, one page, with the total and the counts per status. */
  @Get()
  queue(
    @CurrentUser() actor: AuthenticatedUser,
    @Query() query: ClaimQueueQueryDto,
  ): Promise<ClaimQueueResponse> {
    return this.claims.queue(actor, query);
  }

  /** Earlier claims close to a text being typed, for the filing form (declared before `:id`). */
  @Get('similar')
  similar(@Query() query: SimilarClaimsQueryDto): Promise<SimilarClaim[]> {
    return this.search.similarClaims(query.text);
  }

  /** A claim with its claimant, appearances, sources, files, reply attempts, experts and comments. */
  @Get(':id')
  detail(@UuidParam() id: string): Promise<ClaimDetail> {
    return this.claims.detail(id);
  }

  /** Edits the claim; needs the version the editor saw (409 when stale, nothing overwritten). */
  @Patch(':id')
  update(
    @CurrentUser() actor: AuthenticatedUser,
    @UuidParam() id: string,
    @Body() dto: UpdateClaimDto,
  ): Promise<ClaimDetail> {
    return this.claims.update(actor, id, dto);
  }

  /** Gives the claim to someone (a desk chief), or takes it (a science editor, for themself). */
  @Post(':id/assign')
  @HttpCode(HttpStatus.OK)
  assign(
    @CurrentUser() actor: AuthenticatedUser,
    @UuidParam() id: string,
    @Body() dto: AssignClaimDto,
  ): Promise<ClaimDetail> {
    return this.assignment.assign(actor, id, dto);
  }

  /** The claim's audit events, oldest first, including those of its parts and its sources. */
  @Get(':id/history')
  history(@UuidParam() id: string): Promise<ClaimHistoryEvent[]> {
    return this.claims.history(id);
  }
}
