import { type UpdateRatingLevelRequest } from '@skyledger/contracts';
import { TextField, VersionField } from '../../common/validation/fields';

export class UpdateRatingLevelDto implements UpdateRatingLevelRequest {
  @TextField(60, { optional: true })
  label?: string;

  @TextField(600, { optional: true })
  description?: string;

  @VersionField()
  version: number;
}
