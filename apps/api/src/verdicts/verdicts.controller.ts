import { Body, Controller, Get, HttpCode, HttpStatus, Patch, Post, Put } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import {
  type ClaimVerdictView,
  type SignoffView,
  type VerdictVersionView,
} from '@skyledger/contracts';
import { type AuthenticatedUser } from '../auth/authenticated-user';
import { CurrentUser } from '../common/decorators/current-user.decorator';
import { Roles } from '../common/decorators/roles.decorator';
import { UuidParam } from '../common/decorators/uuid-param.decorator';
import { ReplyWaiverDto } from './dto/reply-waiver.dto';
import { UpdateVerdictVersionDto } from './dto/update-verdict-version.dto';
import { VerdictFieldsDto } from './dto/verdict-fields.dto';
import { SignoffService } from './signoff.service';
import { VerdictsService } from './verdicts.service';

@ApiTags('verdicts')
@ApiBearerAuth()
@Controller('claims/:id')
export class VerdictsController {
  constructor(
    private readonly verdicts: VerdictsService,
    private readonly signoff: SignoffService,
  ) {}

  /** Every version of the claim's verdict, newest first, with sign-off decisions and conflicts. */
  @Get('verdict')
  view(@UuidParam() claimId: string): Promise<ClaimVerdictView> {
    return this.verdicts.view(claimId);
  }

  /** Starts a new draft (science editor, desk chief). */
  @Post('verdict/versions')
  create(
    @CurrentUser() actor: AuthenticatedUser,
    @UuidParam() claimId: string,
    @Body() dto: VerdictFieldsDto,
  ): Promise<VerdictVersionView> {
    return this.verdicts.createDraft(actor, claimId, dto);
  }

  /** Saves a draft with the version the editor saw; a stale save is kept as a conflict (409). */
  @Patch('verdict/versions/:versionId')
  update(
    @CurrentUser() actor: AuthenticatedUser,
    @UuidParam() claimId: string,
    @UuidParam('versionId') versionId: string,
    @Body() dto: UpdateVerdictVersionDto,
  ): Promise<VerdictVersionView> {
    return this.verdicts.updateDraft(actor, claimId, versionId, dto);
  }

  /** The version awaiting sign-off, the one before it, the checklist, and whether you may decide. */
  @Get('signoff')
  signoffView(
    @CurrentUser() actor: AuthenticatedUser,
    @UuidParam() claimId: string,
  ): Promise<SignoffView> {
    return this.signoff.view(actor, claimId);
  }

  /** A desk chief waives the right of reply, with a reason (it shows on the checklist). */
  @Put('reply-waiver')
  @Roles('desk_chief')
  @HttpCode(HttpStatus.NO_CONTENT)
  waiveReply(
    @CurrentUser() actor: AuthenticatedUser,
    @UuidParam() claimId: string,
    @Body() dto: ReplyWaiverDto,
  ): Promise<void> {
    return this.verdicts.waiveReply(actor, claimId, dto.reason, dto.version);
  }
}
