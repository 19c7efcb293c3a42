import { Module, type DynamicModule } from '@nestjs/common';
import { APP_GUARD } from '@nestjs/core';
import { AccountModule } from './account/account.module.js';
import { AccountDeletionModule } from './account-deletion/account-deletion.module.js';
import { AdminModule } from './admin/admin.module.js';
import { AlertModule } from './alert/alert.module.js';
import { AuthModule } from './auth/auth.module.js';
import { BakePlanModule } from './bake-plan/bake-plan.module.js';
import { ClassLogsModule } from './class-logs/class-logs.module.js';
import { ClassAccessModule } from './classroom/class-access.module.js';
import { ClassroomModule } from './classroom/classroom.module.js';
import { CommentModule } from './comment/comment.module.js';
import { SessionGuard } from './common/session.guard.js';
import { ConfigModule } from './config.module.js';
import { CultureModule } from './culture/culture.module.js';
import type { AppConfig } from './config.js';
import { DatabaseModule } from './db/database.module.js';
import { DurabilityCheck } from './db/durability.js';
import type { DatabaseHandle } from './db/database.js';
import { DevMailModule } from './dev/dev-mail.module.js';
import { DevPushModule } from './dev/dev-push.module.js';
import { FeedingModule } from './feeding/feeding.module.js';
import { FormulaModule } from './formula/formula.module.js';
import { HealthModule } from './health/health.module.js';
import { LogbookTransferModule } from './logbook-transfer/logbook-transfer.module.js';
import { MailModule } from './mail/mail.module.js';
import { PasswordResetModule } from './password-reset/password-reset.module.js';
import { PhotoModule } from './photo/photo.module.js';
import { PushModule } from './push/push.module.js';
import { RiseCheckModule } from './rise-check/rise-check.module.js';
import { TemperatureModule } from './temperature/temperature.module.js';

@Module({})
export class AppModule {
  static forRoot(config: AppConfig, database: DatabaseHandle): DynamicModule {
    return {
      module: AppModule,
      imports: [
        ConfigModule.forRoot(config),
        DatabaseModule.forRoot(database),
        MailModule,
        AccountModule,
        AccountDeletionModule,
        AuthModule,
        PasswordResetModule,
        // Development only: config.ts leaves devMailUrl null in production.
        ...(config.mail.devMailUrl ? [DevMailModule] : []),
        ...(config.push?.devServiceUrl ? [DevPushModule] : []),
        AdminModule,
        HealthModule,
        CultureModule,
        FeedingModule,
        RiseCheckModule,
        TemperatureModule,
        LogbookTransferModule,
        FormulaModule,
        BakePlanModule,
        AlertModule,
        PushModule,
        ClassAccessModule,
        ClassroomModule,
        ClassLogsModule,
        CommentModule,
        PhotoModule,
      ],
      providers: [{ provide: APP_GUARD, useClass: SessionGuard }, DurabilityCheck],
    };
  }
}
