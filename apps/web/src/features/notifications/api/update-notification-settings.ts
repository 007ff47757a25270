import type {
  NotificationSettingsView,
  UpdateNotificationSettingsRequest,
} from '@skyledger/contracts';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { notificationKeys } from './notification-keys';

/** Turns off the kinds listed and on all the others. */
export function updateNotificationSettings(
  body: UpdateNotificationSettingsRequest,
): Promise<NotificationSettingsView> {
  return api.put<NotificationSettingsView>('/me/notifications', body);
}

export function useUpdateNotificationSettings() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateNotificationSettings,
    onSuccess: (settings) => queryClient.setQueryData(notificationKeys.settings(), settings),
  });
}
