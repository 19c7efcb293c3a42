import { Module } from '@nestjs/common';
import { PassportModule } from '@nestjs/passport';
import { AccountModule } from '../account/account.module.js';
import { AuthController } from './auth.controller.js';
import { LocalStrategy } from './local.strategy.js';

@Module({
  imports: [PassportModule, AccountModule],
  controllers: [AuthController],
  providers: [LocalStrategy],
})
export class AuthModule {}
