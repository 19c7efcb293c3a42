import { Module } from '@nestjs/common';
import { IdempotencyModule } from '../common/idempotency/idempotency.module.js';
import { CommentAlerts } from './comment.alerts.js';
import { CommentController } from './comment.controller.js';
import { CommentRepository } from './comment.repository.js';
import { CommentService } from './comment.service.js';

/**
 * Comment threads on feedings and bakes, between a baker and their instructors. ClassAccessModule
 * and AlertModule are global: the access rule and the alert notifier come from there.
 */
@Module({
  imports: [IdempotencyModule],
  controllers: [CommentController],
  providers: [CommentRepository, CommentService, CommentAlerts],
})
export class CommentModule {}
