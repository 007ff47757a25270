import {
  notificationKinds,
  type NotificationKind,
  type UpdateNotificationSettingsRequest,
} from '@skyledger/contracts';
import { ArrayMaxSize, IsArray, IsIn } from 'class-validator';

export class UpdateNotificationSettingsDto implements UpdateNotificationSettingsRequest {
  /** The kinds to turn off; every other kind is on. */
  @IsArray()
  @ArrayMaxSize(notificationKinds.length)
  @IsIn(notificationKinds, {
    each: true,
    message: `disabled may hold only: ${notificationKinds.join(', ')}`,
  })
  disabled: NotificationKind[];
}
