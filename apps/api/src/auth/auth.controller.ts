import {
  Body,
  Controller,
  Get,
  HttpCode,
  HttpStatus,
  Inject,
  Param,
  Post,
  Req,
  Res,
  UseGuards,
} from '@nestjs/common';
import { ApiTags } from '@nestjs/swagger';
import { SkipThrottle, ThrottlerGuard } from '@nestjs/throttler';
import { type InvitationInfo, type SessionResponse } from '@skyledger/contracts';
import { type Request, type Response } from 'express';
import { Public } from '../common/decorators/public.decorator';
import { authConfig, type AuthConfig } from '../config/configuration';
import { AuthService, type IssuedSession } from './auth.service';
import { NewPasswordDto } from './dto/new-password.dto';
import { PasswordResetRequestDto } from './dto/password-reset-request.dto';
import { SignInDto } from './dto/sign-in.dto';
import { refreshCookieName, refreshCookieOptions } from './refresh-cookie';

/** Sign-in, sessions, invitations and password resets. Attempts are rate-limited per address. */
@ApiTags('auth')
@Public()
@UseGuards(ThrottlerGuard)
@Controller('auth')
export class AuthController {
  constructor(
    private readonly auth: AuthService,
    @Inject(authConfig.KEY) private readonly config: AuthConfig,
  ) {}

  @Post('sign-in')
  @HttpCode(HttpStatus.OK)
  async signIn(
    @Body() dto: SignInDto,
    @Res({ passthrough: true }) response: Response,
  ): Promise<SessionResponse> {
    return this.withCookie(response, await this.auth.signIn(dto.email, dto.password));
  }

  /** Exchanges the refresh cookie for a new access token and a new refresh cookie. */
  @Post('refresh')
  @SkipThrottle()
  @HttpCode(HttpStatus.OK)
  async refresh(
    @Req() request: Request,
    @Res({ passthrough: true }) response: Response,
  ): Promise<SessionResponse> {
    try {
      return this.withCookie(response, await this.auth.refresh(this.cookieToken(request)));
    } catch (error) {
      response.clearCookie(refreshCookieName, refreshCookieOptions(this.config.cookieSecure));
      throw error;
    }
  }

  @Post('sign-out')
  @SkipThrottle()
  @HttpCode(HttpStatus.NO_CONTENT)
  async signOut(
    @Req() request: Request,
    @Res({ passthrough: true }) response: Response,
  ): Promise<void> {
    await this.auth.signOut(this.cookieToken(request));
    response.clearCookie(refreshCookieName, refreshCookieOptions(this.config.cookieSecure));
  }

  /** What the accept-invite page shows: who is invited, as what, until when. */
  @Get('invitations/:token')
  invitation(@Param('token') token: string): Promise<InvitationInfo> {
    return this.auth.invitation(token);
  }

  @Post('invitations/accept')
  @HttpCode(HttpStatus.NO_CONTENT)
  acceptInvitation(@Body() dto: NewPasswordDto): Promise<void> {
    return this.auth.acceptInvitation(dto.token, dto.password);
  }

  /** Mails a reset link if the account exists; answers the same either way. */
  @Post('password-reset/request')
  @HttpCode(HttpStatus.ACCEPTED)
  requestPasswordReset(@Body() dto: PasswordResetRequestDto): Promise<void> {
    return this.auth.requestPasswordReset(dto.email);
  }

  @Post('password-reset')
  @HttpCode(HttpStatus.NO_CONTENT)
  resetPassword(@Body() dto: NewPasswordDto): Promise<void> {
    return this.auth.resetPassword(dto.token, dto.password);
  }

  private cookieToken(request: Request): string | undefined {
    const value: unknown = request.cookies?.[refreshCookieName];
    return typeof value === 'string' && value.length > 0 ? value : undefined;
  }

  private withCookie(response: Response, session: IssuedSession): SessionResponse {
    response.cookie(
      refreshCookieName,
      session.refreshToken,
      refreshCookieOptions(this.config.cookieSecure, this.config.refreshTtlDays * 86_400_000),
    );
    return session.body;
  }
}
