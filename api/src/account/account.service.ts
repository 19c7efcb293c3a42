import { ConflictException, Injectable, NotFoundException, Optional } from '@nestjs/common';
import type {
  Account,
  AccountListResponse,
  AdminAccount,
  ChangePasswordRequest,
  Role,
  SignUpRequest,
  UpdateAccountRequest,
} from '@peakwise/shared';
import { AlertScheduler } from '../alert/alert.scheduler.js';
import { PasswordService } from '../auth/password.service.js';
import { passwordProblem } from '../auth/password-policy.js';
import { fieldError } from '../common/validation.js';
import { toAccount, toAdminAccount } from './account.mapper.js';
import { AccountRepository, type AccountRecord } from './account.repository.js';

@Injectable()
export class AccountService {
  constructor(
    private readonly accounts: AccountRepository,
    private readonly passwords: PasswordService,
    // Optional: the seed builds this service without Nest, before any alert exists.
    @Optional() private readonly alerts?: AlertScheduler,
  ) {}

  async signUp(request: SignUpRequest, role: Role = 'baker'): Promise<AccountRecord> {
    const problem = passwordProblem(request.password, [request.email, request.displayName]);
    if (problem) throw fieldError('password', problem);
    const passwordHash = await this.passwords.hash(request.password);
    const created = await this.accounts.insert({
      email: request.email,
      displayName: request.displayName,
      timeZone: request.timeZone,
      passwordHash,
      role,
    });
    if (!created) {
      throw new ConflictException({
        message: 'An account with this e-mail already exists. Sign in instead?',
        details: [{ field: 'email', message: 'This e-mail is already registered.' }],
      });
    }
    return created;
  }

  /** The account these credentials open, or null. Takes the same time whether or not the e-mail exists. */
  async authenticate(email: string, password: string): Promise<AccountRecord | null> {
    const account = await this.accounts.findByEmail(email);
    if (!account) return this.passwords.verifyNothing(password).then(() => null);
    return (await this.passwords.verify(password, account.passwordHash)) ? account : null;
  }

  async update(account: AccountRecord, changes: UpdateAccountRequest): Promise<Account> {
    const updated = await this.accounts.update(account.id, changes);
    if (!updated) throw new NotFoundException('This account no longer exists.');
    // Alert words name local times, and quiet hours are local: both follow the new zone.
    if (updated.timeZone !== account.timeZone) await this.alerts?.refreshAccount(account.id);
    return toAccount(updated);
  }

  /**
   * Changes the password and signs out every other device of this account; the device that made
   * the change stays signed in (it just proved the password). Returns the session epoch the
   * current session must carry from now on.
   */
  async changePassword(account: AccountRecord, request: ChangePasswordRequest, currentSid: string): Promise<number> {
    if (!(await this.passwords.verify(request.currentPassword, account.passwordHash))) {
      throw fieldError('currentPassword', 'This is not your current password.');
    }
    const problem = passwordProblem(request.newPassword, [account.email, account.displayName]);
    if (problem) throw fieldError('newPassword', problem);
    await this.accounts.update(account.id, { passwordHash: await this.passwords.hash(request.newPassword) });
    return this.accounts.endSessions(account.id, currentSid);
  }

  async list(limit: number, offset: number): Promise<AccountListResponse> {
    const { items, total } = await this.accounts.list(limit, offset);
    return { items: items.map(toAdminAccount), total };
  }

  /** Disables or enables an account; `by` is the admin asking, who cannot disable themselves. */
  async setDisabled(by: AccountRecord, id: string, disabled: boolean): Promise<AdminAccount> {
    // An admin who disabled themselves would be signed out mid-click and could not undo it.
    if (disabled && by.id === id) {
      throw new ConflictException({
        message: 'You cannot disable your own account.',
        details: [{ field: 'disabled', message: 'Ask another admin to do this.' }],
      });
    }
    const updated = await this.accounts.setDisabled(id, disabled);
    if (!updated) throw new NotFoundException('No account with this id.');
    return toAdminAccount(updated);
  }

  async setRole(id: string, role: Role): Promise<Account> {
    const result = await this.accounts.setRoleKeepingAnAdmin(id, role);
    if (result === 'not-found') throw new NotFoundException('No account with this id.');
    if (result === 'last-admin') {
      // Otherwise nobody could ever manage roles again short of editing the database.
      throw new ConflictException({
        message: 'This is the last admin account; make someone else admin first.',
        details: [{ field: 'role', message: 'At least one admin must remain.' }],
      });
    }
    return toAccount(result);
  }
}
