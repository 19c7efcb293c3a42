import { Module } from '@nestjs/common';
import { DevMailController } from './dev-mail.controller.js';

@Module({ controllers: [DevMailController] })
export class DevMailModule {}
