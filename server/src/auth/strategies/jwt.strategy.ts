import { Inject, Injectable, UnauthorizedException } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { PassportStrategy } from '@nestjs/passport';
import type { Request } from 'express';
import { ExtractJwt, Strategy } from 'passport-jwt';
import { CLOCK, type Clock } from '../../common/clock';
import type { AuthConfig } from '../../config';
import type { AccountRow } from '../../database/schema';
import { AccountsService } from '../../users/accounts.service';
import { accountDisabledMessage, sessionExpiredMessage, signInRequiredMessage } from '../auth-messages';
import { isSessionTokenPayload, sessionTokenAlgorithm } from '../session-token';

/**
 * Reads the session token from the httpOnly cookie or an `Authorization: Bearer` header, checks it
 * against the injected clock, and loads the account on every request, so a disabled account or a
 * changed role takes effect on the next request.
 */
@Injectable()
export class JwtStrategy extends PassportStrategy(Strategy, 'jwt') {
  constructor(
    config: ConfigService,
    private readonly accounts: AccountsService,
    @Inject(CLOCK) private readonly clock: Clock,
  ) {
    const auth = config.getOrThrow<AuthConfig>('auth');
    const fromCookie = (request: Request): string | null => {
      const cookies: unknown = request.cookies;
      if (typeof cookies !== 'object' || cookies === null) return null;
      const token = (cookies as Record<string, unknown>)[auth.cookieName];
      return typeof token === 'string' && token !== '' ? token : null;
    };
    super({
      jwtFromRequest: ExtractJwt.fromExtractors([fromCookie, ExtractJwt.fromAuthHeaderAsBearerToken()]),
      secretOrKey: auth.jwtSecret,
      algorithms: [sessionTokenAlgorithm],
      // Expiry is checked in validate() against the injected clock, not the wall clock.
      ignoreExpiration: true,
    });
  }

  async validate(payload: unknown): Promise<AccountRow> {
    if (!isSessionTokenPayload(payload)) throw new UnauthorizedException(signInRequiredMessage);
    const nowS = this.clock.now().getTime() / 1000;
    if (payload.exp <= nowS) throw new UnauthorizedException(sessionExpiredMessage);
    const account = await this.accounts.findById(payload.sub);
    if (!account) throw new UnauthorizedException(signInRequiredMessage);
    if (account.disabled) throw new UnauthorizedException(accountDisabledMessage);
    return account;
  }
}
