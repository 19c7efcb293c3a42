import { createHash, randomBytes } from 'node:crypto';
import { Injectable, Logger } from '@nestjs/common';
import type { PasswordResetConfirmRequest, PasswordResetRequested } from '@peakwise/shared';
import { AccountRepository } from '../account/account.repository.js';
import { PasswordService } from '../auth/password.service.js';
import { passwordProblem } from '../auth/password-policy.js';
import { fieldError } from '../common/validation.js';
import { MailService } from '../mail/mail.service.js';
import { AccountTokenRepository } from './account-token.repository.js';

/** One hour: long enough to find the mail, short enough that an old inbox is no skeleton key. */
export const RESET_LINK_MINUTES = 60;

const INVALID_LINK = 'This reset link has expired or was already used. Ask for a new one.';

function hashToken(token: string): string {
  return createHash('sha256').update(token).digest('hex');
}

@Injectable()
export class PasswordResetService {
  private readonly logger = new Logger('PasswordReset');

  constructor(
    private readonly accounts: AccountRepository,
    private readonly tokens: AccountTokenRepository,
    private readonly passwords: PasswordService,
    private readonly mail: MailService,
  ) {}

  /**
   * Answers the same, in about the same time, whether or not the address has an account: the mail
   * goes out after the answer, so an SMTP round trip cannot reveal which addresses are registered.
   */
  async request(email: string): Promise<PasswordResetRequested> {
    const account = await this.accounts.findByEmail(email);
    if (account) {
      // 32 random bytes: unguessable; only its hash is stored (sql/0007).
      const token = randomBytes(32).toString('base64url');
      const expiresAt = new Date(Date.now() + RESET_LINK_MINUTES * 60_000);
      const id = await this.tokens.insert({
        accountId: account.id,
        purpose: 'password-reset',
        tokenHash: hashToken(token),
        expiresAt,
      });
      void this.sendLink(account.email, account.displayName, token, id);
    }
    return { accepted: true, expiresInMinutes: RESET_LINK_MINUTES };
  }

  /** Sets the new password, spends the token and every other open reset link, and signs out everywhere. */
  async confirm(request: PasswordResetConfirmRequest): Promise<void> {
    const tokenHash = hashToken(request.token);
    const accountId = await this.tokens.findUsable(tokenHash, 'password-reset');
    const account = accountId ? await this.accounts.findById(accountId) : undefined;
    if (!account) throw fieldError('token', INVALID_LINK);
    // Checked before the token is spent, so a refused password leaves the link usable for a retry.
    const problem = passwordProblem(request.password, [account.email, account.displayName]);
    if (problem) throw fieldError('password', problem);
    const passwordHash = await this.passwords.hash(request.password);
    if ((await this.tokens.consume(tokenHash, 'password-reset')) !== account.id)
      throw fieldError('token', INVALID_LINK);
    await this.accounts.update(account.id, { passwordHash });
    await this.tokens.consumeAll(account.id, 'password-reset');
    // Whoever knew the old password may be signed in somewhere; a reset ends every session.
    await this.accounts.endSessions(account.id);
  }

  private async sendLink(to: string, name: string, token: string, tokenId: string): Promise<void> {
    const body = this.mail.compose({
      heading: 'Set a new Peakwise password',
      paragraphs: [
        `Hello ${name},`,
        'Someone (hopefully you) asked to reset the password of your Peakwise account. Choose a new one with the link below.',
      ],
      action: { label: 'Choose a new password', path: `/reset-password?token=${encodeURIComponent(token)}` },
      note: `The link works for ${RESET_LINK_MINUTES} minutes and only once. If you did not ask for it, ignore this mail: your password stays as it is.`,
      alertSettingsLink: false,
    });
    try {
      await this.mail.send({ to, subject: 'Set a new Peakwise password', key: `password-reset:${tokenId}`, ...body });
    } catch (error) {
      // Never the token or the address in the log: it would be a usable link.
      this.logger.error(`password-reset mail ${tokenId} not sent: ${(error as Error).message}`);
    }
  }
}
