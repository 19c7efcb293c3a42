import { Global, Module } from '@nestjs/common';
import { BakePlanRepository } from '../bake-plan/bake-plan.repository.js';
import { CultureSummaryRepository } from '../culture/culture-summary.repository.js';
import { CultureRepository } from '../culture/culture.repository.js';
import { PushModule } from '../push/push.module.js';
import { AlertListRepository } from './alert-list.repository.js';
import { AlertClock } from './alert.clock.js';
import { AlertController } from './alert.controller.js';
import { AlertNotifier } from './alert.notify.js';
import { AlertQueue } from './alert.queue.js';
import { AlertRepository } from './alert.repository.js';
import { AlertScheduler } from './alert.scheduler.js';
import { AlertService } from './alert.service.js';
import { AlertWorker } from './alert.worker.js';

/**
 * Global so the logbook and Bench services can call AlertScheduler without importing this module
 * (which reads their tables through its own repository instances: no import cycle).
 */
@Global()
@Module({
  imports: [PushModule],
  controllers: [AlertController],
  providers: [
    AlertClock,
    AlertNotifier,
    AlertQueue,
    AlertRepository,
    AlertListRepository,
    AlertScheduler,
    AlertService,
    AlertWorker,
    CultureRepository,
    CultureSummaryRepository,
    BakePlanRepository,
  ],
  exports: [AlertScheduler, AlertRepository, AlertWorker, AlertClock, AlertNotifier],
})
export class AlertModule {}
