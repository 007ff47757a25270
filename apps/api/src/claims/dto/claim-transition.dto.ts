import {
  claimStatuses,
  setAsideReasons,
  type ClaimStatus,
  type ClaimTransitionRequest,
  type SetAsideReason,
} from '@skyledger/contracts';
import { EnumField, TextField, VersionField } from '../../common/validation/fields';

export class ClaimTransitionDto implements ClaimTransitionRequest {
  @EnumField(claimStatuses)
  to: ClaimStatus;

  @EnumField(setAsideReasons, { optional: true })
  reason?: SetAsideReason;

  @TextField(2000, { optional: true })
  note?: string;

  @VersionField()
  version: number;
}
