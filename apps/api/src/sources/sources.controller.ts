import { Body, Controller, Get, Patch, Query } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import { type SourceView } from '@skyledger/contracts';
import { type AuthenticatedUser } from '../auth/authenticated-user';
import { claimRoles } from '../claims/claim-policy';
import { CurrentUser } from '../common/decorators/current-user.decorator';
import { Roles } from '../common/decorators/roles.decorator';
import { UuidParam } from '../common/decorators/uuid-param.decorator';
import { SearchSourcesQueryDto } from './dto/search-sources-query.dto';
import { UpdateSourceDto } from './dto/update-source.dto';
import { SourcesService } from './sources.service';

/** The desk's sources, shared by every claim that cites them. */
@ApiTags('sources')
@ApiBearerAuth()
@Controller('sources')
export class SourcesController {
  constructor(private readonly sources: SourcesService) {}

  /** Up to 20 sources whose title or a word of it starts with `q`, or with that DOI. */
  @Get()
  search(@Query() query: SearchSourcesQueryDto): Promise<SourceView[]> {
    return this.sources.search(query.q);
  }

  /** Edits the citation or the grade; needs the version the editor saw. */
  @Patch(':id')
  @Roles(...claimRoles.contribute)
  update(
    @CurrentUser() actor: AuthenticatedUser,
    @UuidParam() id: string,
    @Body() dto: UpdateSourceDto,
  ): Promise<SourceView> {
    return this.sources.update(actor, id, dto);
  }
}
