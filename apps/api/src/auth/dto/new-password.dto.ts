import {
  PASSWORD_MAX_LENGTH,
  PASSWORD_MIN_LENGTH,
  type AcceptInvitationRequest,
  type PasswordResetRequest,
} from '@skyledger/contracts';
import { IsNotEmpty, IsString, MaxLength, MinLength } from 'class-validator';

/** A one-time link's token with the new password chosen on its page. */
export class NewPasswordDto implements AcceptInvitationRequest, PasswordResetRequest {
  @IsString()
  @IsNotEmpty()
  @MaxLength(200)
  token: string;

  @IsString()
  @MinLength(PASSWORD_MIN_LENGTH, {
    message: `password must be at least ${PASSWORD_MIN_LENGTH} characters`,
  })
  @MaxLength(PASSWORD_MAX_LENGTH)
  password: string;
}
