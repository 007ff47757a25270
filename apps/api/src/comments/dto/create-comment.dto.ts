import { COMMENT_MAX_LENGTH, type CreateCommentRequest } from '@skyledger/contracts';
import { TextField } from '../../common/validation/fields';

export class CreateCommentDto implements CreateCommentRequest {
  @TextField(COMMENT_MAX_LENGTH)
  body: string;
}
