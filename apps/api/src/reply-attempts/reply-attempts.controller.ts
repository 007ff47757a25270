import { claimPartController } from '../claims/claim-part.controller';
import { CreateReplyAttemptDto } from './dto/create-reply-attempt.dto';
import { UpdateReplyAttemptDto } from './dto/update-reply-attempt.dto';
import { replyAttemptKind } from './reply-attempt-kind';

/** Right of reply: `claims/:id/reply-attempts`. */
export const ReplyAttemptsController = claimPartController({
  path: 'reply-attempts',
  kind: replyAttemptKind,
  createDto: CreateReplyAttemptDto,
  updateDto: UpdateReplyAttemptDto,
  toValues: ({ contactedAt, deadline, ...fields }) => ({
    ...fields,
    ...(contactedAt ? { contactedAt: new Date(contactedAt) } : {}),
    ...(deadline ? { deadline: new Date(deadline) } : {}),
  }),
});
