import { type ReplyAttemptView } from '@skyledger/contracts';
import { claimRoles } from '../claims/claim-policy';
import { type ClaimPartKind } from '../claims/claim-part-kind';
import { ApiError } from '../common/errors/api-error';
import { ReplyAttempt } from './entities/reply-attempt.entity';
import { toReplyAttemptView } from './reply-attempt-view';

export const replyAttemptKind: ClaimPartKind<ReplyAttempt, ReplyAttemptView> = {
  entity: ReplyAttempt,
  name: 'reply_attempt',
  addRoles: claimRoles.research,
  toView: toReplyAttemptView,
  summarise: (attempt) => ({
    contacted: attempt.contacted,
    channel: attempt.channel,
    outcome: attempt.outcome,
  }),
  beforeSave(_manager, _claim, attempt) {
    if (attempt.outcome === 'replied' && !attempt.reply) {
      throw ApiError.unprocessable('Give the reply when they replied', { reply: 'required' });
    }
    if (attempt.deadline && attempt.deadline < attempt.contactedAt) {
      throw ApiError.unprocessable('The deadline cannot be before the contact', {
        deadline: 'beforeContact',
      });
    }
    return Promise.resolve();
  },
};
