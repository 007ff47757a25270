import { PartialType } from '@nestjs/swagger';
import { type UpdateReplyAttemptRequest } from '@skyledger/contracts';
import { VersionField } from '../../common/validation/fields';
import { CreateReplyAttemptDto } from './create-reply-attempt.dto';

export class UpdateReplyAttemptDto
  extends PartialType(CreateReplyAttemptDto)
  implements UpdateReplyAttemptRequest
{
  @VersionField()
  version: number;
}
