import { type CreateClaimRequest } from '@skyledger/contracts';
import { CreateAppearanceDto } from '../../appearances/dto/create-appearance.dto';
import { CreateClaimantDto } from '../../claimants/dto/create-claimant.dto';
import { NestedField, UuidField } from '../../common/validation/fields';
import { ClaimFieldsDto } from './claim-fields.dto';

/** File a claim: an existing claimant by id, or a new one, and optionally where it was seen. */
export class CreateClaimDto extends ClaimFieldsDto implements CreateClaimRequest {
  @UuidField({ optional: true })
  claimantId?: string;

  @NestedField(() => CreateClaimantDto, { optional: true })
  claimant?: CreateClaimantDto;

  @NestedField(() => CreateAppearanceDto, { optional: true })
  firstAppearance?: CreateAppearanceDto;
}
