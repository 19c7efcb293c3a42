import { Module } from '@nestjs/common';
import { AccountModule } from '../account/account.module.js';
import { CultureModule } from '../culture/culture.module.js';
import { FeedingModule } from '../feeding/feeding.module.js';
import { ClassDrillController } from './class-drill.controller.js';
import { ClassDrillService } from './class-drill.service.js';
import { ClassLogsAccess } from './class-logs.access.js';
import { ClassLogsRepository } from './class-logs.repository.js';
import { ClassRosterController } from './class-roster.controller.js';
import { ClassRosterService } from './class-roster.service.js';
import { OwnerReads } from './owner-reads.js';

/**
 * The instructor's read-only view of a class: roster, progress chart, drill-down to a student's
 * logs, through the owner's own read paths (OwnerReads) once ClassLogsAccess has said yes.
 */
@Module({
  imports: [AccountModule, CultureModule, FeedingModule],
  controllers: [ClassRosterController, ClassDrillController],
  providers: [ClassLogsRepository, ClassLogsAccess, ClassRosterService, ClassDrillService, OwnerReads],
})
export class ClassLogsModule {}
