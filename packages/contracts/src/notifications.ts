import { z } from 'zod';

/** The mails the desk sends about claims; each person may turn each kind off. */
export const notificationKinds = [
  'claim_assigned',
  'signoff_requested',
  'sent_back',
  'cleared',
  'published',
  'scheduled_published',
] as const;
export type NotificationKind = (typeof notificationKinds)[number];

export const notificationKindLabels: Record<NotificationKind, string> = {
  claim_assigned: 'A claim is given to me',
  signoff_requested: 'A verdict awaits sign-off (copy desk)',
  sent_back: 'My verdict is sent back, with the notes',
  cleared: 'My verdict is cleared',
  published: 'An explainer I worked on is published',
  scheduled_published: 'A scheduled publication has gone out',
};

export interface NotificationSettingsView {
  kinds: Array<{ kind: NotificationKind; label: string; enabled: boolean }>;
}

export const updateNotificationSettingsSchema = z.object({
  disabled: z.array(z.enum(notificationKinds)).max(notificationKinds.length),
});
export type UpdateNotificationSettingsRequest = z.infer<typeof updateNotificationSettingsSchema>;
