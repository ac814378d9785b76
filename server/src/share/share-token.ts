import { createHmac } from 'node:crypto';
import { JwtService } from '@nestjs/jwt';

/** HMAC SHA-256 (RFC 7518 §3.2), the only algorithm share tokens are signed and accepted with. */
const shareTokenAlgorithm = 'HS256';

/** What a share token says: the trip, the link's version, and when it stops working. */
export interface ShareTokenClaims {
  tripId: string;
  version: number;
  /** Issued at, seconds since the epoch. */
  iat: number;
  /** Expires at, seconds since the epoch. */
  exp: number;
}

/** Why a token was refused. */
export type ShareTokenProblem = 'invalid' | 'expired';

/**
 * The share-link key when none is configured: HMAC-SHA256 of a fixed label under the session secret, so
 * the two keys differ (a share token never passes as a session) without a second secret to manage.
 */
export function deriveShareSecret(sessionSecret: string): string {
  return createHmac('sha256', sessionSecret).update('gramwatt share links v1').digest('base64url');
}

/**
 * Signs and checks share tokens: JWTs (`@nestjs/jwt`) whose subject is the trip and whose `ver` is the
 * share row's version. Signing is deterministic for the same claims, so a link can be shown again.
 */
export class ShareTokens {
  private readonly jwt: JwtService;

  constructor(secret: string) {
    this.jwt = new JwtService({ secret });
  }

  sign(claims: ShareTokenClaims): string {
    return this.jwt.sign(
      { sub: claims.tripId, ver: claims.version, typ: 'share', iat: claims.iat, exp: claims.exp },
      { algorithm: shareTokenAlgorithm },
    );
  }

  /** The claims of a good token, checked at `nowS` (seconds), or why it is not good. */
  verify(token: string, nowS: number): ShareTokenClaims | ShareTokenProblem {
    let payload: unknown;
    try {
      payload = this.jwt.verify(token, { algorithms: [shareTokenAlgorithm], clockTimestamp: nowS });
    } catch (error) {
      return error instanceof Error && error.name === 'TokenExpiredError' ? 'expired' : 'invalid';
    }
    if (typeof payload !== 'object' || payload === null) return 'invalid';
    const { sub, ver, typ, iat, exp } = payload as Record<string, unknown>;
    if (
      typ !== 'share' ||
      typeof sub !== 'string' ||
      typeof ver !== 'number' ||
      typeof iat !== 'number' ||
      typeof exp !== 'number'
    ) {
      return 'invalid';
    }
    return { tripId: sub, version: ver, iat, exp };
  }
}
