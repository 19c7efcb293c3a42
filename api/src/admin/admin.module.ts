import { Module } from '@nestjs/common';
import { AccountModule } from '../account/account.module.js';
import { AdminController } from './admin.controller.js';

@Module({ imports: [AccountModule], controllers: [AdminController] })
export class AdminModule {}
