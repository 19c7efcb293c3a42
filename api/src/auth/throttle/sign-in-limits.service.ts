import { Inject, Injectable } from '@nestjs/common';
import { normalizeIp } from '@nestjs/throttler';
import { APP_CONFIG, type AppConfig } from '../../config.js';
import { AuthThrottleRepository } from './auth-throttle.repository.js';
import { throttleKey } from './pg-throttler.storage.js';
import { TooManyAttemptsException } from '../../common/too-many-attempts.exception.js';

export const DEFAULT_ACCOUNT_FAILURE_LIMIT = 10;
export const DEFAULT_ACCOUNT_FAILURE_WINDOW_MINUTES = 15;

/**
 * The per-account brake on password guessing, beside the per-address one (ThrottlerGuard).
 * Failed sign-ins are counted per e-mail across all addresses, so an attacker spreading guesses
 * over many addresses still gets only `limit` per window at one account.
 *
 * Locking the account for everyone would hand that attacker a way to keep its owner out. So the
 * limit does not apply from an address the account has signed in from successfully before
 * (`sign_in_address`): the owner at home or at work still gets in during an attack; only new
 * addresses wait out the window. We chose this over counting per (account, address), which
 * would let a spread-out attack through at the per-address rate.
 *
 * Counted by e-mail whether or not an account has it, so a locked answer does not reveal which
 * e-mails are registered. A success does not reset the count (that would give the attacker a
 * fresh allowance whenever the owner signs in).
 */
@Injectable()
export class SignInLimitsService {
  private readonly limit: number;
  private readonly windowMs: number;

  constructor(
    private readonly repository: AuthThrottleRepository,
    @Inject(APP_CONFIG) config: AppConfig,
  ) {
    this.limit = config.signInFailuresPerAccount ?? DEFAULT_ACCOUNT_FAILURE_LIMIT;
    this.windowMs = (config.signInFailureWindowMinutes ?? DEFAULT_ACCOUNT_FAILURE_WINDOW_MINUTES) * 60_000;
  }

  /** Throws a 429 when the account has had too many failures and this address is new to it. */
  async checkAllowed(email: string, address: string): Promise<void> {
    const count = await this.repository.peek(this.key(email));
    if (count.hits < this.limit) return;
    if (await this.repository.isKnownAddress(email, normalizeIp(address))) return;
    throw new TooManyAttemptsException(
      'Too many failed sign-ins to this account. Wait a while, or sign in from a device you have used before.',
      Math.max(1, count.secondsToExpire),
    );
  }

  async recordFailure(email: string): Promise<void> {
    // The limit passed to hit() is only for its block column, which this brake does not use.
    await this.repository.hit(this.key(email), this.windowMs, 2_147_483_647, 0);
  }

  async recordSuccess(accountId: string, address: string): Promise<void> {
    // An IPv6 address is kept as its /64, as the address brake counts it: devices change the
    // rest of it every day or so (RFC 8981 temporary addresses).
    await this.repository.rememberAddress(accountId, normalizeIp(address));
  }

  private key(email: string): string {
    return throttleKey('sign-in-failure', email);
  }
}
