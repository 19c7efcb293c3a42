import { ForbiddenException, Injectable, UnauthorizedException } from '@nestjs/common';
import { PassportStrategy } from '@nestjs/passport';
import type { FastifyRequest } from 'fastify';
import { Strategy } from 'passport-local';
import { AccountService } from '../account/account.service.js';
import type { AccountRecord } from '../account/account.repository.js';
import { SignInLimitsService } from './throttle/sign-in-limits.service.js';

/** One message for a wrong e-mail and a wrong password, so sign-in does not reveal who has an account. */
export const BAD_CREDENTIALS = 'E-mail or password is incorrect.';

export const ACCOUNT_DISABLED = 'This account has been disabled. Ask an administrator to enable it again.';

@Injectable()
export class LocalStrategy extends PassportStrategy(Strategy) {
  constructor(
    private readonly accounts: AccountService,
    private readonly limits: SignInLimitsService,
  ) {
    super({ usernameField: 'email', passwordField: 'password', passReqToCallback: true });
  }

  async validate(req: FastifyRequest, email: string, password: string): Promise<AccountRecord> {
    // Before the password is checked: a right guess during a lock must look like any other.
    await this.limits.checkAllowed(email, req.ip);
    const account = await this.accounts.authenticate(email, password);
    if (!account) {
      await this.limits.recordFailure(email);
      throw new UnauthorizedException(BAD_CREDENTIALS);
    }
    // Only after the right password, so the refusal tells nothing to someone without it.
    if (account.disabledAt) throw new ForbiddenException(ACCOUNT_DISABLED);
    await this.limits.recordSuccess(account.id, req.ip);
    return account;
  }
}
