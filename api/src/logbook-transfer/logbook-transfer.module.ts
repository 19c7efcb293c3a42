import { Module } from '@nestjs/common';
import { CultureModule } from '../culture/culture.module.js';
import { LogbookTransferController } from './logbook-transfer.controller.js';
import { LogbookTransferRepository } from './logbook-transfer.repository.js';
import { LogbookTransferService } from './logbook-transfer.service.js';

@Module({
  imports: [CultureModule],
  controllers: [LogbookTransferController],
  providers: [LogbookTransferRepository, LogbookTransferService],
})
export class LogbookTransferModule {}
