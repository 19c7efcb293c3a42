import { Module } from '@nestjs/common';
import { PushController } from './push.controller.js';
import { PushKeys } from './push-keys.js';
import { PushRepository } from './push.repository.js';
import { PushSender } from './push.sender.js';
import { PushService } from './push.service.js';

/** Web push: VAPID keys, browser subscriptions, and sending through the push services. */
@Module({
  controllers: [PushController],
  providers: [PushKeys, PushRepository, PushSender, PushService],
  exports: [PushSender],
})
export class PushModule {}
