import type { NotificationSettingsView } from '@skyledger/contracts';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { notificationKeys } from './notification-keys';

/** Which kinds of notification mail I get. */
export function getNotificationSettings(): Promise<NotificationSettingsView> {
  return api.get<NotificationSettingsView>('/me/notifications');
}

export const notificationSettingsQueryOptions = () =>
  queryOptions({ queryKey: notificationKeys.settings(), queryFn: getNotificationSettings });

/** Not suspending: the card shows its own loading state inside the account page. */
export function useNotificationSettings() {
  return useQuery(notificationSettingsQueryOptions());
}
