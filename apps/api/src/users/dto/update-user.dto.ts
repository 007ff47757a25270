import {
  DISPLAY_NAME_MAX_LENGTH,
  roles,
  type Role,
  type UpdateUserRequest,
} from '@skyledger/contracts';
import { IsIn, IsInt, IsNotEmpty, IsOptional, IsString, MaxLength, Min } from 'class-validator';
import { Trim } from '../../common/transforms';

export class UpdateUserDto implements UpdateUserRequest {
  @IsOptional()
  @Trim()
  @IsString()
  @IsNotEmpty()
  @MaxLength(DISPLAY_NAME_MAX_LENGTH)
  displayName?: string;

  @IsOptional()
  @IsIn(roles, { message: `role must be one of: ${roles.join(', ')}` })
  role?: Role;

  @IsOptional()
  @IsIn(['active', 'disabled'], { message: 'status must be active or disabled' })
  status?: 'active' | 'disabled';

  /** The version the editor last saw. */
  @IsInt()
  @Min(1)
  version: number;
}
