import { Module } from '@nestjs/common';
import { PasswordService } from '../auth/password.service.js';
import { AccountController } from './account.controller.js';
import { AccountRepository } from './account.repository.js';
import { AccountService } from './account.service.js';

@Module({
  controllers: [AccountController],
  providers: [AccountRepository, AccountService, PasswordService],
  exports: [AccountRepository, AccountService],
})
export class AccountModule {}
