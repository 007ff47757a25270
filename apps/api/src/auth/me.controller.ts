import { Body, Controller, Get, Inject, Put } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import {
  type CurrentUser as CurrentUserBody,
  type NotificationSettingsView,
} from '@skyledger/contracts';
import { CurrentUser } from '../common/decorators/current-user.decorator';
import { appConfig, type AppConfig } from '../config/configuration';
import { UpdateNotificationSettingsDto } from '../users/dto/update-notification-settings.dto';
import { NotificationSettingsService } from '../users/notification-settings.service';
import { UsersService } from '../users/users.service';
import { toCurrentUser } from '../users/user-views';
import { type AuthenticatedUser } from './authenticated-user';

@ApiTags('auth')
@ApiBearerAuth()
@Controller('me')
export class MeController {
  constructor(
    private readonly users: UsersService,
    private readonly notifications: NotificationSettingsService,
    @Inject(appConfig.KEY) private readonly app: AppConfig,
  ) {}

  /** Who I am, and the desk's time zone and name that my screens use. */
  @Get()
  async me(@CurrentUser() user: AuthenticatedUser): Promise<CurrentUserBody> {
    return toCurrentUser(await this.users.findById(user.id), this.app);
  }

  /** Which notification mails I get. */
  @Get('notifications')
  notificationSettings(@CurrentUser() user: AuthenticatedUser): Promise<NotificationSettingsView> {
    return this.notifications.view(user.id);
  }

  /** Turns kinds of notification mail off (those listed) and on (the rest). */
  @Put('notifications')
  updateNotificationSettings(
    @CurrentUser() user: AuthenticatedUser,
    @Body() dto: UpdateNotificationSettingsDto,
  ): Promise<NotificationSettingsView> {
    return this.notifications.update(user.id, dto.disabled);
  }
}
