import { z } from 'zod';
import type { Role, UserStatus } from './roles.js';

export const PASSWORD_MIN_LENGTH = 12;
export const PASSWORD_MAX_LENGTH = 200;
export const EMAIL_MAX_LENGTH = 254;
export const DISPLAY_NAME_MAX_LENGTH = 120;

export const emailSchema = z
  .email({ error: 'Enter a valid e-mail address' })
  .max(EMAIL_MAX_LENGTH, { error: `At most ${EMAIL_MAX_LENGTH} characters` });

export const newPasswordSchema = z
  .string()
  .min(PASSWORD_MIN_LENGTH, { error: `At least ${PASSWORD_MIN_LENGTH} characters` })
  .max(PASSWORD_MAX_LENGTH, { error: `At most ${PASSWORD_MAX_LENGTH} characters` });

export const signInSchema = z.object({
  email: emailSchema,
  password: z.string().min(1, { error: 'Enter your password' }).max(PASSWORD_MAX_LENGTH),
});
export type SignInRequest = z.infer<typeof signInSchema>;

/** The signed-in person, as `GET /api/me` and sign-in return them. */
export interface CurrentUser {
  id: string;
  email: string;
  displayName: string;
  role: Role;
  status: UserStatus;
  /** The desk's time zone (IANA), in which the desk shows every date and time. */
  deskTimeZone: string;
  /** The newsroom the desk works for, as readers see it. */
  newsroomName: string;
}

/** Body of a successful sign-in or refresh; the refresh token travels only in its cookie. */
export interface SessionResponse {
  accessToken: string;
  /** Seconds until the access token expires. */
  expiresIn: number;
  user: CurrentUser;
}

export const acceptInvitationSchema = z.object({
  token: z.string().min(1).max(200),
  password: newPasswordSchema,
});
export type AcceptInvitationRequest = z.infer<typeof acceptInvitationSchema>;

/** What the accept-invite page shows before the password is set. */
export interface InvitationInfo {
  email: string;
  displayName: string;
  role: Role;
  expiresAt: string;
}

export const passwordResetRequestSchema = z.object({ email: emailSchema });
export type PasswordResetRequestRequest = z.infer<typeof passwordResetRequestSchema>;

export const passwordResetSchema = z.object({
  token: z.string().min(1).max(200),
  password: newPasswordSchema,
});
export type PasswordResetRequest = z.infer<typeof passwordResetSchema>;
