import { EMAIL_MAX_LENGTH, type PasswordResetRequestRequest } from '@skyledger/contracts';
import { IsEmail, MaxLength } from 'class-validator';
import { Trim } from '../../common/transforms';

export class PasswordResetRequestDto implements PasswordResetRequestRequest {
  @Trim()
  @IsEmail({}, { message: 'email must be an e-mail address' })
  @MaxLength(EMAIL_MAX_LENGTH)
  email: string;
}
