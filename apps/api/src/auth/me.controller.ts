import { Controller, Get } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import { type CurrentUser as CurrentUserBody } from '@skyledger/contracts';
import { CurrentUser } from '../common/decorators/current-user.decorator';
import { UsersService } from '../users/users.service';
import { toCurrentUser } from '../users/user-views';
import { type AuthenticatedUser } from './authenticated-user';

@ApiTags('auth')
@ApiBearerAuth()
@Controller('me')
export class MeController {
  constructor(private readonly users: UsersService) {}

  @Get()
  async me(@CurrentUser() user: AuthenticatedUser): Promise<CurrentUserBody> {
    return toCurrentUser(await this.users.findById(user.id));
  }
}
