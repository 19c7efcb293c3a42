import { Injectable } from '@nestjs/common';
import type { DeleteAccountRequest } from '@peakwise/shared';
import type { AccountRecord } from '../account/account.repository.js';
import { PasswordService } from '../auth/password.service.js';
import { fieldError } from '../common/validation.js';
import { PhotoTrash } from '../photo/photo.trash.js';
import { AccountDeletionRepository } from './account-deletion.repository.js';

/** A baker leaving for good: their password again, then the account and all of its logs. */
@Injectable()
export class AccountDeletionService {
  constructor(
    private readonly accounts: AccountDeletionRepository,
    private readonly passwords: PasswordService,
    private readonly photoTrash: PhotoTrash,
  ) {}

  async delete(account: AccountRecord, request: DeleteAccountRequest): Promise<void> {
    if (!(await this.passwords.verify(request.password, account.passwordHash))) {
      throw fieldError('password', 'This is not your password.');
    }
    await this.accounts.delete(account.id);
    // The stored images now, rather than at the hourly sweep.
    await this.photoTrash.empty();
  }
}
