import { Module } from '@nestjs/common';

/** Web push: VAPID keys, browser subscriptions, and sending through the push service. */
@Module({})
export class PushModule {}
