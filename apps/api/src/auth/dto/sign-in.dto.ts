import { EMAIL_MAX_LENGTH, PASSWORD_MAX_LENGTH, type SignInRequest } from '@skyledger/contracts';
import { IsEmail, IsNotEmpty, IsString, MaxLength } from 'class-validator';
import { Trim } from '../../common/transforms';

export class SignInDto implements SignInRequest {
  @Trim()
  @IsEmail({}, { message: 'email must be an e-mail address' })
  @MaxLength(EMAIL_MAX_LENGTH)
  email: string;

  @IsString()
  @IsNotEmpty()
  @MaxLength(PASSWORD_MAX_LENGTH)
  password: string;
}
