import { Module } from '@nestjs/common';
import { IdempotencyModule } from '../common/idempotency/idempotency.module.js';
import { ClassInviteController, ClassInviteLinkController } from './class-invite.controller.js';
import { ClassInviteRepository } from './class-invite.repository.js';
import { ClassInviteService } from './class-invite.service.js';
import { ClassJoinController } from './class-join.controller.js';
import { ClassJoinService } from './class-join.service.js';
import { ClassController } from './class.controller.js';
import { ClassRepository } from './class.repository.js';
import { ClassService } from './class.service.js';

/** Classes, members, invitations and joining. Who may read whose logs: ClassAccessRepository. */
@Module({
  imports: [IdempotencyModule],
  controllers: [ClassController, ClassInviteController, ClassInviteLinkController, ClassJoinController],
  providers: [ClassRepository, ClassInviteRepository, ClassService, ClassInviteService, ClassJoinService],
  exports: [ClassService],
})
export class ClassroomModule {}
