import {
  CLAIMANT_NAME_MAX_LENGTH,
  claimantKinds,
  type ClaimantKind,
  type CreateClaimantRequest,
} from '@skyledger/contracts';
import { EnumField, TextField } from '../../common/validation/fields';

export class CreateClaimantDto implements CreateClaimantRequest {
  @TextField(CLAIMANT_NAME_MAX_LENGTH)
  name: string;

  @EnumField(claimantKinds)
  kind: ClaimantKind;

  @TextField(160, { optional: true })
  affiliation?: string;

  @TextField(2000, { optional: true })
  notes?: string;
}
