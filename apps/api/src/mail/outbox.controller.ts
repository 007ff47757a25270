import { Controller, Get, HttpCode, HttpStatus, Post, Query } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import { type OutboxMessageView, type OutboxPage } from '@skyledger/contracts';
import { type AuthenticatedUser } from '../auth/authenticated-user';
import { CurrentUser } from '../common/decorators/current-user.decorator';
import { Roles } from '../common/decorators/roles.decorator';
import { UuidParam } from '../common/decorators/uuid-param.decorator';
import { OutboxQueryDto } from './dto/outbox-query.dto';
import { OutboxAdminService } from './outbox-admin.service';

@ApiTags('outbox')
@ApiBearerAuth()
@Roles('desk_chief')
@Controller('outbox')
export class OutboxController {
  constructor(private readonly outbox: OutboxAdminService) {}

  @Get()
  list(@Query() query: OutboxQueryDto): Promise<OutboxPage> {
    return this.outbox.list(query);
  }

  @Post(':id/retry')
  @HttpCode(HttpStatus.OK)
  retry(
    @CurrentUser() actor: AuthenticatedUser,
    @UuidParam() id: string,
  ): Promise<OutboxMessageView> {
    return this.outbox.retry(actor, id);
  }
}
