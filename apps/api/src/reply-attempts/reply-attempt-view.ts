import { type ReplyAttemptView } from '@skyledger/contracts';
import { toPersonRef } from '../common/views/person-ref';
import { type ReplyAttempt } from './entities/reply-attempt.entity';

/** Needs `createdBy` loaded. */
export function toReplyAttemptView(attempt: ReplyAttempt): ReplyAttemptView {
  return {
    id: attempt.id,
    contacted: attempt.contacted,
    contactedAt: attempt.contactedAt.toISOString(),
    channel: attempt.channel,
    deadline: attempt.deadline ? attempt.deadline.toISOString() : null,
    outcome: attempt.outcome,
    reply: attempt.reply,
    loggedBy: toPersonRef(attempt.createdBy),
    createdAt: attempt.createdAt.toISOString(),
    version: attempt.version,
  };
}
