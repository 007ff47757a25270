import { Body, Controller, Delete, HttpCode, HttpStatus, Post } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import { type ClaimSourceView } from '@skyledger/contracts';
import { type AuthenticatedUser } from '../auth/authenticated-user';
import { CurrentUser } from '../common/decorators/current-user.decorator';
import { UuidParam } from '../common/decorators/uuid-param.decorator';
import { LinkSourceDto } from './dto/link-source.dto';
import { SourcesService } from './sources.service';

/** The sources cited for one claim. */
@ApiTags('sources')
@ApiBearerAuth()
@Controller('claims/:id/sources')
export class ClaimSourcesController {
  constructor(private readonly sources: SourcesService) {}

  /** Cites an existing source (`sourceId`) or a new one (`source`) for the claim. */
  @Post()
  link(
    @CurrentUser() actor: AuthenticatedUser,
    @UuidParam() claimId: string,
    @Body() dto: LinkSourceDto,
  ): Promise<ClaimSourceView> {
    return this.sources.link(actor, claimId, dto);
  }

  /** Stops citing the source for this claim; the source stays for other claims. */
  @Delete(':sourceId')
  @HttpCode(HttpStatus.NO_CONTENT)
  unlink(
    @CurrentUser() actor: AuthenticatedUser,
    @UuidParam() claimId: string,
    @UuidParam('sourceId') sourceId: string,
  ): Promise<void> {
    return this.sources.unlink(actor, claimId, sourceId);
  }
}
