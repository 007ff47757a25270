import { type RerunWorkingRequest } from '@skyledger/contracts';
import { VersionField } from '../../common/validation/fields';

export class RerunWorkingDto implements RerunWorkingRequest {
  @VersionField()
  version: number;
}
