import { type AssignClaimRequest } from '@skyledger/contracts';
import { IsUUID, ValidateIf } from 'class-validator';
import { VersionField } from '../../common/validation/fields';

export class AssignClaimDto implements AssignClaimRequest {
  /** Who researches the claim; null takes it off whoever has it. */
  @ValidateIf((_dto, value) => value !== null)
  @IsUUID('all', { message: 'assigneeId must be a UUID or null' })
  assigneeId: string | null;

  @VersionField()
  version: number;
}
