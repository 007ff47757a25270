import { PartialType } from '@nestjs/swagger';
import { type UpdateAppearanceRequest } from '@skyledger/contracts';
import { IsOptional, IsUUID, ValidateIf } from 'class-validator';
import { VersionField } from '../../common/validation/fields';
import { CreateAppearanceDto } from './create-appearance.dto';

export class UpdateAppearanceDto
  extends PartialType(CreateAppearanceDto)
  implements UpdateAppearanceRequest
{
  /** An attachment of the same claim holding the archived capture; null removes it. */
  @IsOptional()
  @ValidateIf((_dto, value) => value !== null)
  @IsUUID('all', { message: 'captureAttachmentId must be a UUID or null' })
  captureAttachmentId?: string | null;

  @VersionField()
  version: number;
}
