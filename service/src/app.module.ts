import { Module, type DynamicModule } from '@nestjs/common';
import { APP_FILTER, APP_GUARD } from '@nestjs/core';
import { ConfigModule, registerAs } from '@nestjs/config';
import { CqrsModule } from '@nestjs/cqrs';
import { ThrottlerModule } from '@nestjs/throttler';
import type { DatabaseHandle } from '@fuelwright/db';
import { loadAppConfig, type AppConfig } from './config/app.config.js';
import { DatabaseModule } from './database/database.module.js';
import { AuthModule } from './auth/auth.module.js';
import { UsersModule } from './users/users.module.js';
import { KartsModule } from './karts/karts.module.js';
import { CasesModule } from './cases/cases.module.js';
import { SharingModule } from './sharing/sharing.module.js';
import { PhotosModule } from './photos/photos.module.js';
import { LearningModule } from './learning/learning.module.js';
import { MailModule } from './mail/mail.module.js';
import { DiagnosisModule } from './diagnosis/diagnosis.module.js';
import { ConditionsModule } from './conditions/conditions.module.js';
import { JettingModule } from './jetting/jetting.module.js';
import { PreferencesModule } from './preferences/preferences.module.js';
import { DemoModule } from './demo/demo.module.js';
import { AccessModule } from './common/access/access.module.js';
import { HealthController } from './health/health.controller.js';
import { SessionGuard } from './common/guards/session.guard.js';
import { RolesGuard } from './common/guards/roles.guard.js';
import { ApiExceptionFilter } from './common/filters/http-exception.filter.js';

export interface AppModuleOptions {
  /** Values that replace what the environment says (tests). */
  config?: Partial<AppConfig>;
  /** An opened, migrated database to use instead of the configured one (tests). */
  database?: DatabaseHandle;
}

@Module({})
export class AppModule {
  static forRoot(options: AppModuleOptions = {}): DynamicModule {
    const config = { ...loadAppConfig(process.env), ...options.config };
    return {
      module: AppModule,
      imports: [
        ConfigModule.forRoot({ isGlobal: true, ignoreEnvFile: true, load: [registerAs('app', () => config)] }),
        CqrsModule.forRoot(),
        // Right after CqrsModule and before anything that brings in MailModule: all three are global, and
        // global modules' bootstrap hooks run in the order they are first imported. The demo history
        // needs the command handlers registered and must be written before the mail sender starts.
        DemoModule,
        // Limits apply only where a route opts in with @UseGuards(ThrottlerGuard): the account routes
        // (sign-in, sign-up, e-mail verification, password reset), sending and accepting invitations,
        // the open rank route (POST /api/diagnosis/rank) and the air calculator (POST /api/conditions/air).
        // Not every route: the in-memory store slows down when every route uses it.
        ThrottlerModule.forRoot([{ name: 'default', ttl: config.throttleTtlMs, limit: config.throttleLimit }]),
        DatabaseModule.forRoot({ handle: options.database }),
        AccessModule,
        AuthModule,
        UsersModule,
        KartsModule,
        DiagnosisModule,
        CasesModule,
        MailModule,
        SharingModule,
        PhotosModule,
        LearningModule,
        ConditionsModule,
        JettingModule,
        PreferencesModule,
      ],
      controllers: [HealthController],
      providers: [
        { provide: APP_GUARD, useClass: SessionGuard },
        { provide: APP_GUARD, useClass: RolesGuard },
        { provide: APP_FILTER, useClass: ApiExceptionFilter },
      ],
    };
  }
}
