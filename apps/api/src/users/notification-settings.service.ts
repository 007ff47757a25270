import { Injectable } from '@nestjs/common';
import { InjectRepository } from '@nestjs/typeorm';
import {
  notificationKindLabels,
  notificationKinds,
  type NotificationKind,
  type NotificationSettingsView,
} from '@skyledger/contracts';
import { Repository } from 'typeorm';
import { User } from './entities/user.entity';
import { UsersService } from './users.service';

/** Which notification mails each person wants: all, unless they turned a kind off. */
@Injectable()
export class NotificationSettingsService {
  constructor(
    @InjectRepository(User) private readonly users: Repository<User>,
    private readonly people: UsersService,
  ) {}

  async view(userId: string): Promise<NotificationSettingsView> {
    const off = (await this.people.findById(userId)).notificationsOff ?? [];
    return {
      kinds: notificationKinds.map((kind) => ({
        kind,
        label: notificationKindLabels[kind],
        enabled: !off.includes(kind),
      })),
    };
  }

  async update(userId: string, disabled: NotificationKind[]): Promise<NotificationSettingsView> {
    await this.people.findById(userId);
    const off = notificationKinds.filter((kind) => disabled.includes(kind));
    await this.users.update(userId, { notificationsOff: off.length ? off : null });
    return this.view(userId);
  }
}
