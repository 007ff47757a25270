import { PartialType } from '@nestjs/swagger';
import { type UpdateClaimRequest } from '@skyledger/contracts';
import { UuidField, VersionField } from '../../common/validation/fields';
import { ClaimFieldsDto } from './claim-fields.dto';

export class UpdateClaimDto extends PartialType(ClaimFieldsDto) implements UpdateClaimRequest {
  @UuidField({ optional: true })
  claimantId?: string;

  @VersionField()
  version: number;
}
