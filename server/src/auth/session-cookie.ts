import type { CookieOptions, Response } from 'express';
import type { AuthConfig } from '../config';

/** Cookie options for the session: httpOnly so scripts cannot read it, SameSite=Lax against cross-site posts. */
export function sessionCookieOptions(config: AuthConfig): CookieOptions {
  return { httpOnly: true, sameSite: 'lax', secure: config.cookieSecure, path: '/' };
}

/** Puts the session token in its cookie, expiring with the token. */
export function setSessionCookie(response: Response, token: string, config: AuthConfig): void {
  response.cookie(config.cookieName, token, { ...sessionCookieOptions(config), maxAge: config.tokenLifetimeS * 1000 });
}

/** Clears the session cookie (same name, path and flags, so the browser drops it). */
export function clearSessionCookie(response: Response, config: AuthConfig): void {
  response.clearCookie(config.cookieName, sessionCookieOptions(config));
}
