import { type UpdateWorkingRequest } from '@skyledger/contracts';
import { TextField, VersionField } from '../../common/validation/fields';

export class UpdateWorkingDto implements UpdateWorkingRequest {
  @TextField(2000, { optional: true })
  note?: string;

  @VersionField()
  version: number;
}
