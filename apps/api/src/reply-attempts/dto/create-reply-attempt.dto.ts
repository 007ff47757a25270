import {
  replyChannels,
  replyOutcomes,
  type CreateReplyAttemptRequest,
  type ReplyChannel,
  type ReplyOutcome,
} from '@skyledger/contracts';
import { EnumField, InstantField, TextField } from '../../common/validation/fields';

export class CreateReplyAttemptDto implements CreateReplyAttemptRequest {
  /** Whom the desk contacted: the claimant, their office, a spokesperson. */
  @TextField(200)
  contacted: string;

  @InstantField()
  contactedAt: string;

  @EnumField(replyChannels)
  channel: ReplyChannel;

  @InstantField({ optional: true })
  deadline?: string;

  @EnumField(replyOutcomes)
  outcome: ReplyOutcome;

  /** Their reply in their words or a summary; required when they replied. */
  @TextField(5000, { optional: true })
  reply?: string;
}
