import { Module } from '@nestjs/common';
import { IdempotencyModule } from '../common/idempotency/idempotency.module.js';
import { CultureModule } from '../culture/culture.module.js';
import { FormulaModule } from '../formula/formula.module.js';
import { BakePlanController } from './bake-plan.controller.js';
import { PlanKineticsSource } from './bake-plan.kinetics.js';
import { BakePlanRepository } from './bake-plan.repository.js';
import { BakePlanClock, BakePlanService } from './bake-plan.service.js';
import { KitchenReadingController } from './kitchen-reading.controller.js';
import { KitchenReadingRepository } from './kitchen-reading.repository.js';
import { KitchenReadingService } from './kitchen-reading.service.js';

@Module({
  imports: [CultureModule, FormulaModule, IdempotencyModule],
  controllers: [BakePlanController, KitchenReadingController],
  providers: [
    BakePlanRepository,
    BakePlanService,
    BakePlanClock,
    PlanKineticsSource,
    KitchenReadingRepository,
    KitchenReadingService,
  ],
})
export class BakePlanModule {}
