import { Body, Controller, Get, Patch, Post, Query } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import { type ClaimantView } from '@skyledger/contracts';
import { type AuthenticatedUser } from '../auth/authenticated-user';
import { claimRoles } from '../claims/claim-policy';
import { CurrentUser } from '../common/decorators/current-user.decorator';
import { Roles } from '../common/decorators/roles.decorator';
import { UuidParam } from '../common/decorators/uuid-param.decorator';
import { ClaimantsService } from './claimants.service';
import { CreateClaimantDto } from './dto/create-claimant.dto';
import { SearchClaimantsQueryDto } from './dto/search-claimants-query.dto';
import { UpdateClaimantDto } from './dto/update-claimant.dto';

/** Who made claims: picked or created while filing. */
@ApiTags('claimants')
@ApiBearerAuth()
@Controller('claimants')
export class ClaimantsController {
  constructor(private readonly claimants: ClaimantsService) {}

  /** Up to 20 claimants whose name or a word of it starts with `q`. */
  @Get()
  search(@Query() query: SearchClaimantsQueryDto): Promise<ClaimantView[]> {
    return this.claimants.search(query.q);
  }

  @Post()
  @Roles(...claimRoles.contribute)
  create(
    @CurrentUser() actor: AuthenticatedUser,
    @Body() dto: CreateClaimantDto,
  ): Promise<ClaimantView> {
    return this.claimants.create(actor, dto);
  }

  /** Needs the version the editor saw; naming a private individual publicly is the desk chief's call. */
  @Patch(':id')
  @Roles('science_editor', 'desk_chief')
  update(
    @CurrentUser() actor: AuthenticatedUser,
    @UuidParam() id: string,
    @Body() dto: UpdateClaimantDto,
  ): Promise<ClaimantView> {
    return this.claimants.update(actor, id, dto);
  }
}
