import { type ReplyWaiverRequest } from '@skyledger/contracts';
import { TextField, VersionField } from '../../common/validation/fields';

export class ReplyWaiverDto implements ReplyWaiverRequest {
  @TextField(1000)
  reason: string;

  @VersionField()
  version: number;
}
