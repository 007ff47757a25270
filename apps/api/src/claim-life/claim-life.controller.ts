import { Body, Controller, HttpCode, HttpStatus, Post } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import { type ClaimDetail } from '@skyledger/contracts';
import { type AuthenticatedUser } from '../auth/authenticated-user';
import { ClaimTransitionDto } from '../claims/dto/claim-transition.dto';
import { CurrentUser } from '../common/decorators/current-user.decorator';
import { UuidParam } from '../common/decorators/uuid-param.decorator';
import { ClaimLifeService } from './claim-life.service';

@ApiTags('claims')
@ApiBearerAuth()
@Controller('claims')
export class ClaimLifeController {
  constructor(private readonly life: ClaimLifeService) {}

  /**
   * Moves the claim along its life: submit for sign-off, send back (with notes) or clear
   * (the copy desk, never the version's author), back into research, or set aside.
   */
  @Post(':id/transitions')
  @HttpCode(HttpStatus.OK)
  transition(
    @CurrentUser() actor: AuthenticatedUser,
    @UuidParam() id: string,
    @Body() dto: ClaimTransitionDto,
  ): Promise<ClaimDetail> {
    return this.life.transition(actor, id, dto);
  }
}
