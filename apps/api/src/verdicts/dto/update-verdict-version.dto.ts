import { type UpdateVerdictVersionRequest } from '@skyledger/contracts';
import { VersionField } from '../../common/validation/fields';
import { VerdictFieldsDto } from './verdict-fields.dto';

export class UpdateVerdictVersionDto
  extends VerdictFieldsDto
  implements UpdateVerdictVersionRequest
{
  @VersionField()
  version: number;
}
