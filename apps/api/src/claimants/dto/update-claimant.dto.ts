import { PartialType } from '@nestjs/swagger';
import { type UpdateClaimantRequest } from '@skyledger/contracts';
import { BooleanField, VersionField } from '../../common/validation/fields';
import { CreateClaimantDto } from './create-claimant.dto';

export class UpdateClaimantDto
  extends PartialType(CreateClaimantDto)
  implements UpdateClaimantRequest
{
  /** Only a desk chief may name a private individual on public pages. */
  @BooleanField({ optional: true })
  nameShownPublicly?: boolean;

  @VersionField()
  version: number;
}
