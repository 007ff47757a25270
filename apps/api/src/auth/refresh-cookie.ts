import { type CookieOptions } from 'express';

export const refreshCookieName = 'skyledger_refresh';

/** The refresh token rides only in this cookie: script cannot read it, other sites cannot send it. */
export function refreshCookieOptions(secure: boolean, maxAgeMs?: number): CookieOptions {
  return {
    httpOnly: true,
    sameSite: 'strict',
    secure,
    path: '/api/auth',
    ...(maxAgeMs !== undefined ? { maxAge: maxAgeMs } : {}),
  };
}
