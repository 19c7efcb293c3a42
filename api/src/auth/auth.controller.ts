import { Body, Controller, HttpCode, Post, Req, Res, UseGuards } from '@nestjs/common';
import {
  ApiBody,
  ApiCreatedResponse,
  ApiForbiddenResponse,
  ApiNoContentResponse,
  ApiOkResponse,
  ApiTags,
  ApiTooManyRequestsResponse,
  ApiUnauthorizedResponse,
} from '@nestjs/swagger';
import type { Account } from '@peakwise/shared';
import type { FastifyReply, FastifyRequest } from 'fastify';
import { toAccount } from '../account/account.mapper.js';
import type { AccountRecord } from '../account/account.repository.js';
import { AccountService } from '../account/account.service.js';
import { AccountView } from '../account/dto/account.view.js';
import { ThrottlerGuard } from '@nestjs/throttler';
import { Public } from '../common/auth.decorators.js';
import { SignInDto } from './dto/sign-in.dto.js';
import { SignUpDto } from './dto/sign-up.dto.js';
import { LocalAuthGuard } from './local-auth.guard.js';
import { SignInLimitsService } from './throttle/sign-in-limits.service.js';

/** Starts a fresh session for the account: a new id, so a session id planted before sign-in is useless. */
async function startSession(req: FastifyRequest, account: AccountRecord): Promise<void> {
  await req.session.regenerate();
  req.session.set('accountId', account.id);
  req.session.set('sessionEpoch', account.sessionEpoch);
  await req.session.save();
}

@ApiTags('auth')
@Controller('auth')
export class AuthController {
  constructor(
    private readonly accounts: AccountService,
    private readonly limits: SignInLimitsService,
  ) {}

  @Public()
  @UseGuards(ThrottlerGuard)
  @Post('sign-up')
  @ApiCreatedResponse({ type: AccountView, description: 'Account created and signed in' })
  async signUp(@Body() body: SignUpDto, @Req() req: FastifyRequest): Promise<Account> {
    const account = await this.accounts.signUp(body);
    // The address an account was made from counts as one it signed in from (sign-in-limits.service.ts).
    await this.limits.recordSuccess(account.id, req.ip);
    await startSession(req, account);
    return toAccount(account);
  }

  @Public()
  // The brake counts before the password check, so failed guesses use up the allowance too.
  @UseGuards(ThrottlerGuard, LocalAuthGuard)
  @Post('sign-in')
  @HttpCode(200)
  @ApiBody({ type: SignInDto })
  @ApiOkResponse({ type: AccountView })
  @ApiUnauthorizedResponse({ description: 'E-mail or password is incorrect' })
  @ApiForbiddenResponse({ description: 'The password is right but an admin has disabled the account' })
  @ApiTooManyRequestsResponse({
    description:
      'Too many attempts from this address in the last minute, or too many failed sign-ins to this account from addresses it never used (Retry-After says when to try again)',
  })
  async signIn(@Req() req: FastifyRequest & { user: AccountRecord }): Promise<Account> {
    await startSession(req, req.user);
    return toAccount(req.user);
  }

  /** Public so that signing out with an expired session still succeeds. */
  @Public()
  @Post('sign-out')
  @HttpCode(204)
  @ApiNoContentResponse()
  async signOut(@Req() req: FastifyRequest, @Res({ passthrough: true }) reply: FastifyReply): Promise<void> {
    if (req.session.get('accountId')) await req.session.destroy();
    void reply.clearCookie('peakwise.sid', { path: '/' });
  }
}
