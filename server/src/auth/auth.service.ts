import { randomBytes } from 'node:crypto';
import { Inject, Injectable, type OnModuleInit, UnauthorizedException } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { JwtService } from '@nestjs/jwt';
import type { SignInInput, SignUpInput } from '@gramwatt/shared';
import { CLOCK, type Clock } from '../common/clock';
import type { AuthConfig } from '../config';
import type { AccountRow } from '../database/schema';
import { AccountsService } from '../users/accounts.service';
import { accountDisabledMessage, wrongCredentialsMessage } from './auth-messages';
import { hashPassword, verifyPassword } from './password';
import { type SessionTokenPayload, sessionTokenAlgorithm } from './session-token';

/** Sign-up, sign-in and session tokens. */
@Injectable()
export class AuthService implements OnModuleInit {
  /** A hash of a random password: an unknown e-mail is verified against it so it costs as long as a wrong password. */
  private dummyHash = '';

  constructor(
    private readonly accounts: AccountsService,
    private readonly jwt: JwtService,
    private readonly config: ConfigService,
    @Inject(CLOCK) private readonly clock: Clock,
  ) {}

  async onModuleInit(): Promise<void> {
    this.dummyHash = await hashPassword(randomBytes(32).toString('hex'));
  }

  /** Creates a member account; 409 when the e-mail is taken. */
  async signUp(input: SignUpInput): Promise<AccountRow> {
    return this.accounts.create({
      email: input.email,
      displayName: input.displayName,
      passwordHash: await hashPassword(input.password),
      role: 'member',
    });
  }

  /** The account for these credentials; 401 with one plain message for an unknown e-mail or a wrong password. */
  async signIn(input: SignInInput): Promise<AccountRow> {
    const account = await this.accounts.findByEmail(input.email);
    const matches = await verifyPassword(account?.passwordHash ?? this.dummyHash, input.password);
    if (!account || !matches) throw new UnauthorizedException(wrongCredentialsMessage);
    if (account.disabled) throw new UnauthorizedException(accountDisabledMessage);
    return account;
  }

  /** A signed session token for `account`, issued and expiring by the injected clock. */
  issueToken(account: AccountRow): string {
    const { tokenLifetimeS } = this.config.getOrThrow<AuthConfig>('auth');
    const iat = Math.floor(this.clock.now().getTime() / 1000);
    const payload: SessionTokenPayload = { sub: account.id, iat, exp: iat + tokenLifetimeS };
    return this.jwt.sign(payload, { algorithm: sessionTokenAlgorithm });
  }
}
