import type { NotificationKind, OutboxState } from '@skyledger/contracts';

export const outboxStateLabels: Record<OutboxState, string> = {
  pending: 'Waiting',
  sending: 'Sending',
  sent: 'Sent',
  failed: 'Failed',
};

// The colour repeats the word, which is always there.
export const outboxStateColors = {
  pending: 'amber',
  sending: 'blue',
  sent: 'jade',
  failed: 'red',
} as const satisfies Record<OutboxState, string>;

// The desk's own notifications, the account mails, and the mails to subscribed readers.
type MailKind =
  NotificationKind | 'invitation' | 'password_reset' | 'reader_confirm' | 'reader_update';

const kindLabels: Record<MailKind, string> = {
  claim_assigned: 'Claim assigned',
  signoff_requested: 'Sign-off requested',
  sent_back: 'Verdict sent back',
  cleared: 'Verdict cleared',
  published: 'Explainer published',
  scheduled_published: 'Scheduled publication done',
  invitation: 'Invitation to the desk',
  password_reset: 'Password reset',
  reader_confirm: 'Reader subscription to confirm',
  reader_update: 'Update to a reader',
};

/** What a mail is about, in words; a kind the desk does not know yet shows as stored. */
export function outboxKindLabel(kind: string): string {
  return (kindLabels as Record<string, string>)[kind] ?? kind;
}
