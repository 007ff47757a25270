import type { AuditEventView } from '@skyledger/contracts';
import { describeAction } from '@/features/claims/components/claim/history/history-words';

// Actions outside a claim's history, which the claim page's words do not cover.
const actionWords: Record<string, string> = {
  'claim.reply_waived': 'waived the right of reply',
  'verdict.drafted': 'started a version of the verdict',
  'verdict.edited': 'edited a draft verdict',
  'rating_level.added': 'added a level to the rating scale',
  'rating_level.updated': 'reworded a level of the rating scale',
  'rating_level.removed': 'deleted a level of the rating scale',
  'outbox.retried': 'put a mail back in line',
  'dataset.imported': 'imported a dataset',
  'working.rerun': 're-ran a working',
  'user.invited': 'invited someone to the desk',
  'user.invitation_resent': 'sent an invitation again',
  'user.invitation_accepted': 'accepted an invitation',
  'user.updated': 'changed an account',
  'user.locked': 'was locked out after failed sign-ins',
  'user.password_reset_requested': 'asked to reset a password',
  'user.password_reset': 'reset a password',
  'session.refresh_token_reused': 'reused an old sign-in token (the session was ended)',
};

/** What an event says happened, after the actor's name: "put a mail back in line". */
export function describeAuditAction(event: AuditEventView): string {
  return actionWords[event.action] ?? describeAction(event);
}
