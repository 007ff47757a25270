import {
  DISPLAY_NAME_MAX_LENGTH,
  EMAIL_MAX_LENGTH,
  roles,
  type InviteUserRequest,
  type Role,
} from '@skyledger/contracts';
import { IsEmail, IsIn, IsNotEmpty, IsString, MaxLength } from 'class-validator';
import { Trim } from '../../common/transforms';

export class InviteUserDto implements InviteUserRequest {
  @Trim()
  @IsEmail({}, { message: 'email must be an e-mail address' })
  @MaxLength(EMAIL_MAX_LENGTH)
  email: string;

  @Trim()
  @IsString()
  @IsNotEmpty()
  @MaxLength(DISPLAY_NAME_MAX_LENGTH)
  displayName: string;

  @IsIn(roles, { message: `role must be one of: ${roles.join(', ')}` })
  role: Role;
}
