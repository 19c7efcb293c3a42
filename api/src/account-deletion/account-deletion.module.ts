import { Module } from '@nestjs/common';
import { PasswordService } from '../auth/password.service.js';
import { AccountDeletionController } from './account-deletion.controller.js';
import { AccountDeletionRepository } from './account-deletion.repository.js';
import { AccountDeletionService } from './account-deletion.service.js';

/** POST /api/account/delete. Apart from AccountModule: it reaches every feature's data (through the cascade) and the photo store. */
@Module({
  controllers: [AccountDeletionController],
  providers: [AccountDeletionRepository, AccountDeletionService, PasswordService],
})
export class AccountDeletionModule {}
