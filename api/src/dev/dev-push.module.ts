import { Module } from '@nestjs/common';
import { DevPushController } from './dev-push.controller.js';

@Module({ controllers: [DevPushController] })
export class DevPushModule {}
