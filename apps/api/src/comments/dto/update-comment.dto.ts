import { type UpdateCommentRequest } from '@skyledger/contracts';
import { VersionField } from '../../common/validation/fields';
import { CreateCommentDto } from './create-comment.dto';

export class UpdateCommentDto extends CreateCommentDto implements UpdateCommentRequest {
  @VersionField()
  version: number;
}
