import { Module } from '@nestjs/common';
import { IdempotencyModule } from '../common/idempotency/idempotency.module.js';
import { FormulaController } from './formula.controller.js';
import { FormulaRepository } from './formula.repository.js';
import { FormulaService } from './formula.service.js';

@Module({
  imports: [IdempotencyModule],
  controllers: [FormulaController],
  providers: [FormulaRepository, FormulaService],
  exports: [FormulaService],
})
export class FormulaModule {}
