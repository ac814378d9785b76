import { Body, Controller, Get, HttpCode, HttpStatus, Post, Res, UseGuards } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { ApiTags } from '@nestjs/swagger';
import { ThrottlerGuard } from '@nestjs/throttler';
import type { Response } from 'express';
import { ZodResponse } from 'nestjs-zod';
import { ApiErrorResponses, ApiSession } from '../common/api-error-responses.decorator';
import type { AuthConfig } from '../config';
import type { AccountRow } from '../database/schema';
import { AccountResponseDto } from '../users/account.dto';
import { toAccount } from '../users/account-view';
import { SignInDto, SignUpDto } from './auth.dto';
import { AuthService } from './auth.service';
import { CurrentAccount } from './decorators/current-account.decorator';
import { Public } from './decorators/public.decorator';
import { clearSessionCookie, setSessionCookie } from './session-cookie';

/** Sign up, sign in, sign out and the current account. The session lives in an httpOnly cookie. */
@ApiTags('auth')
@Controller('auth')
export class AuthController {
  constructor(
    private readonly auth: AuthService,
    private readonly config: ConfigService,
  ) {}

  /** Creates a member account and signs it in. */
  @Public()
  @UseGuards(ThrottlerGuard)
  @Post('sign-up')
  @ZodResponse({
    status: HttpStatus.CREATED,
    type: AccountResponseDto,
    description: 'The new account; the session cookie is set',
  })
  @ApiErrorResponses(400, 409, 429)
  async signUp(@Body() body: SignUpDto, @Res({ passthrough: true }) response: Response) {
    const account = await this.auth.signUp(body);
    setSessionCookie(response, this.auth.issueToken(account), this.authConfig());
    return { account: toAccount(account) };
  }

  /** Checks the credentials and sets the session cookie. */
  @Public()
  @UseGuards(ThrottlerGuard)
  @Post('sign-in')
  @ZodResponse({
    status: HttpStatus.OK,
    type: AccountResponseDto,
    description: 'The account; the session cookie is set',
  })
  @ApiErrorResponses(400, 401, 429)
  async signIn(@Body() body: SignInDto, @Res({ passthrough: true }) response: Response) {
    const account = await this.auth.signIn(body);
    setSessionCookie(response, this.auth.issueToken(account), this.authConfig());
    return { account: toAccount(account) };
  }

  /** Clears the session cookie; works without a valid session. */
  @Public()
  @Post('sign-out')
  @HttpCode(HttpStatus.NO_CONTENT)
  signOut(@Res({ passthrough: true }) response: Response): void {
    clearSessionCookie(response, this.authConfig());
  }

  /** The signed-in account. */
  @Get('me')
  @ApiSession()
  @ZodResponse({ status: HttpStatus.OK, type: AccountResponseDto })
  me(@CurrentAccount() account: AccountRow) {
    return { account: toAccount(account) };
  }

  private authConfig(): AuthConfig {
    return this.config.getOrThrow<AuthConfig>('auth');
  }
}
