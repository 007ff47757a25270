import { Body, Controller, Delete, Get, Post } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import { type PublicationView } from '@skyledger/contracts';
import { type AuthenticatedUser } from '../auth/authenticated-user';
import { CurrentUser } from '../common/decorators/current-user.decorator';
import { Roles } from '../common/decorators/roles.decorator';
import { UuidParam } from '../common/decorators/uuid-param.decorator';
import { CancelScheduleDto } from './dto/cancel-schedule.dto';
import { PublishClaimDto } from './dto/publish-claim.dto';
import { PublishingService } from './publishing.service';

@ApiTags('publishing')
@ApiBearerAuth()
@Controller('claims/:id')
export class PublishingController {
  constructor(private readonly publishing: PublishingService) {}

  /** The claim's publications, latest first: scheduled, published and cancelled. */
  @Get('publications')
  list(@UuidParam() claimId: string): Promise<PublicationView[]> {
    return this.publishing.list(claimId);
  }

  /** Publishes the cleared version now, or schedules it (`at` with its `timeZone`). */
  @Post('publish')
  @Roles('copy_desk', 'desk_chief')
  publish(
    @CurrentUser() actor: AuthenticatedUser,
    @UuidParam() claimId: string,
    @Body() dto: PublishClaimDto,
  ): Promise<PublicationView[]> {
    return this.publishing.publish(actor, claimId, dto);
  }

  /** Withdraws a scheduled publication before its time. */
  @Delete('publication-schedule')
  @Roles('copy_desk', 'desk_chief')
  cancelSchedule(
    @CurrentUser() actor: AuthenticatedUser,
    @UuidParam() claimId: string,
    @Body() dto: CancelScheduleDto,
  ): Promise<PublicationView[]> {
    return this.publishing.cancelSchedule(actor, claimId, dto.version);
  }
}
