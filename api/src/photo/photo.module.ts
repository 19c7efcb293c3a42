import { Global, Module } from '@nestjs/common';
import { IdempotencyModule } from '../common/idempotency/idempotency.module.js';
import { PhotoController } from './photo.controller.js';
import { PhotoRepository } from './photo.repository.js';
import { PhotoService } from './photo.service.js';
import { PhotoStorage } from './photo.storage.js';
import { PhotoTrash } from './photo.trash.js';

/**
 * Jar and crumb photos. Global: the feeding, rise check, bake plan and culture services empty the
 * photo trash after their deletes. ClassAccessModule (global) answers who may view.
 */
@Global()
@Module({
  imports: [IdempotencyModule],
  controllers: [PhotoController],
  providers: [PhotoRepository, PhotoService, PhotoStorage, PhotoTrash],
  exports: [PhotoTrash],
})
export class PhotoModule {}
