import { Body, Controller, Get, HttpCode, HttpStatus, Patch, Post, Query } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import { type UserListItem, type UsersListResponse } from '@skyledger/contracts';
import { type AuthenticatedUser } from '../auth/authenticated-user';
import { CurrentUser } from '../common/decorators/current-user.decorator';
import { Roles } from '../common/decorators/roles.decorator';
import { UuidParam } from '../common/decorators/uuid-param.decorator';
import { InviteUserDto } from './dto/invite-user.dto';
import { ListUsersQueryDto } from './dto/list-users-query.dto';
import { UpdateUserDto } from './dto/update-user.dto';
import { UsersService } from './users.service';

/** People and roles: the desk chief's page. */
@ApiTags('users')
@ApiBearerAuth()
@Roles('desk_chief')
@Controller('users')
export class UsersController {
  constructor(private readonly users: UsersService) {}

  @Get()
  list(@Query() query: ListUsersQueryDto): Promise<UsersListResponse> {
    return this.users.list(query);
  }

  /** Invites someone: creates them as invited and e-mails a one-time link to set a password. */
  @Post('invitations')
  invite(
    @CurrentUser() actor: AuthenticatedUser,
    @Body() dto: InviteUserDto,
  ): Promise<UserListItem> {
    return this.users.invite(actor, dto);
  }

  /** Sends an invited person a fresh link; the earlier one stops working. */
  @Post(':id/invitation')
  @HttpCode(HttpStatus.ACCEPTED)
  resendInvitation(
    @CurrentUser() actor: AuthenticatedUser,
    @UuidParam() id: string,
  ): Promise<void> {
    return this.users.resendInvitation(actor, id);
  }

  /** Changes a name, role or status; needs the version the editor saw (409 when stale). */
  @Patch(':id')
  update(
    @CurrentUser() actor: AuthenticatedUser,
    @UuidParam() id: string,
    @Body() dto: UpdateUserDto,
  ): Promise<UserListItem> {
    return this.users.update(actor, id, dto);
  }
}
