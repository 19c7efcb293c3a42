import { Injectable } from '@nestjs/common';

/** Where "now" comes from for scheduling and claims; one provider, so a test may replace it. */
@Injectable()
export class AlertClock {
  now(): Date {
    return new Date();
  }
}
