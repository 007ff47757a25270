import { Module } from '@nestjs/common';
import { TypeOrmModule } from '@nestjs/typeorm';
import { AuditModule } from '../audit/audit.module';
import { MailModule } from '../mail/mail.module';
import { OneTimeToken } from './entities/one-time-token.entity';
import { User } from './entities/user.entity';
import { OneTimeTokensService } from './one-time-tokens.service';
import { PasswordService } from './password.service';
import { PeopleController } from './people.controller';
import { UsersController } from './users.controller';
import { NotificationSettingsService } from './notification-settings.service';
import { UsersService } from './users.service';

@Module({
  imports: [TypeOrmModule.forFeature([User, OneTimeToken]), AuditModule, MailModule],
  controllers: [UsersController, PeopleController],
  providers: [UsersService, OneTimeTokensService, PasswordService, NotificationSettingsService],
  exports: [UsersService, OneTimeTokensService, PasswordService, NotificationSettingsService],
})
export class UsersModule {}
