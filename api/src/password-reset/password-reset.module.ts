import { Module } from '@nestjs/common';
import { AccountModule } from '../account/account.module.js';
import { PasswordService } from '../auth/password.service.js';
import { AccountTokenRepository } from './account-token.repository.js';
import { PasswordResetController } from './password-reset.controller.js';
import { PasswordResetService } from './password-reset.service.js';

/** "Forgot password": an e-mailed single-use link (account_token), then a new password. */
@Module({
  imports: [AccountModule],
  controllers: [PasswordResetController],
  providers: [AccountTokenRepository, PasswordResetService, PasswordService],
  exports: [AccountTokenRepository],
})
export class PasswordResetModule {}
