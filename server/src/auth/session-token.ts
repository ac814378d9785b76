/** The claims in a session token (RFC 7519 registered claims; times in seconds since the epoch). */
export interface SessionTokenPayload {
  /** The account id. */
  sub: string;
  /** Issued at, seconds. */
  iat: number;
  /** Expires at, seconds. */
  exp: number;
}

/** The only algorithm session tokens are signed and accepted with (HMAC SHA-256, RFC 7518 §3.2). */
export const sessionTokenAlgorithm = 'HS256';

export function isSessionTokenPayload(value: unknown): value is SessionTokenPayload {
  if (typeof value !== 'object' || value === null) return false;
  const { sub, iat, exp } = value as Partial<SessionTokenPayload>;
  return typeof sub === 'string' && typeof iat === 'number' && typeof exp === 'number';
}
