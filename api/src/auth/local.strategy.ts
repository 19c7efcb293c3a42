import { Injectable, UnauthorizedException } from '@nestjs/common';
import { PassportStrategy } from '@nestjs/passport';
import { Strategy } from 'passport-local';
import { AccountService } from '../account/account.service.js';
import type { AccountRecord } from '../account/account.repository.js';

/** One message for a wrong e-mail and a wrong password, so sign-in does not reveal who has an account. */
export const BAD_CREDENTIALS = 'E-mail or password is incorrect.';

@Injectable()
export class LocalStrategy extends PassportStrategy(Strategy) {
  constructor(private readonly accounts: AccountService) {
    super({ usernameField: 'email', passwordField: 'password' });
  }

  async validate(email: string, password: string): Promise<AccountRecord> {
    const account = await this.accounts.authenticate(email, password);
    if (!account) throw new UnauthorizedException(BAD_CREDENTIALS);
    return account;
  }
}
