import { type DynamicModule, Module } from '@nestjs/common';
import { ConfigModule, ConfigService } from '@nestjs/config';
import { APP_FILTER, APP_GUARD, APP_INTERCEPTOR, APP_PIPE } from '@nestjs/core';
import { ThrottlerModule } from '@nestjs/throttler';
import { ZodSerializerInterceptor, ZodValidationPipe } from 'nestjs-zod';
import { AdminModule } from './admin/admin.module';
import { tooManyAttemptsMessage } from './auth/auth-messages';
import { AuthModule } from './auth/auth.module';
import { JwtAuthGuard } from './auth/guards/jwt-auth.guard';
import { RolesGuard } from './auth/guards/roles.guard';
import { CatalogueModule } from './catalogue/catalogue.module';
import { ClientStaticModule } from './client-static/client-static.module';
import { ApiExceptionFilter } from './common/api-exception.filter';
import type { Clock } from './common/clock';
import { ClockModule } from './common/clock.module';
import { type AuthConfig, type Env, appConfig, authConfig, databaseConfig, storageConfig } from './config';
import { DatabaseModule } from './database/database.module';
import type { Database } from './database/database.types';
import { HealthModule } from './health/health.module';
import { invitesConfig } from './invites/invites.config';
import { InvitesModule } from './invites/invites.module';
import { LockerFilesModule } from './locker-files/locker-files.module';
import { LockerModule } from './locker/locker.module';
import { mailConfig } from './mail/mail.config';
import { MailModule } from './mail/mail.module';
import { OutboxModule } from './outbox/outbox.module';
import { plansConfig } from './plans/plans.config';
import { PlansModule } from './plans/plans.module';
import { PoolModule } from './pool/pool.module';
import { shareConfig } from './share/share.config';
import { ShareModule } from './share/share.module';
import { TripsModule } from './trips/trips.module';
import { UsersModule } from './users/users.module';

export interface AppModuleOptions {
  /** Environment to read configuration from (default `process.env`). */
  env?: Env;
  /** An open database to use instead of opening one from config; the caller closes it. */
  database?: Database;
  /** Clock for tokens and timestamps (default the wall clock). */
  clock?: Clock;
  /** Serve the built client (default true). */
  serveClient?: boolean;
  /** The plan solver's worker script (default the real one; tests pass one that holds its thread). */
  planWorkerFile?: string;
}

/**
 * The whole server. Global pieces, in order: validation pipe (zod DTOs), response serializer (zod),
 * the one error filter, then the JWT guard (every route unless `@Public()`) and the roles guard.
 */
@Module({})
export class AppModule {
  static forRoot(options: AppModuleOptions = {}): DynamicModule {
    const env = options.env ?? process.env;
    return {
      module: AppModule,
      imports: [
        ConfigModule.forRoot({
          isGlobal: true,
          cache: true,
          ignoreEnvFile: true,
          ignoreEnvVars: true,
          load: [
            appConfig(env),
            authConfig(env),
            databaseConfig(env),
            storageConfig(env),
            mailConfig(env),
            invitesConfig(env),
            shareConfig(env),
            plansConfig(env),
          ],
        }),
        ClockModule.forRoot(options.clock),
        DatabaseModule.forRoot({ database: options.database }),
        ThrottlerModule.forRootAsync({
          inject: [ConfigService],
          useFactory: (config: ConfigService) => {
            const auth = config.getOrThrow<AuthConfig>('auth');
            return {
              // The name `default` makes the throttler answer a plain `Retry-After` header (RFC 9110 §10.2.3).
              throttlers: [{ name: 'default', ttl: auth.rateWindowS * 1000, limit: auth.rateLimit }],
              errorMessage: tooManyAttemptsMessage,
            };
          },
        }),
        UsersModule,
        AuthModule,
        AdminModule,
        HealthModule,
        LockerFilesModule,
        CatalogueModule,
        LockerModule,
        TripsModule,
        MailModule,
        OutboxModule,
        InvitesModule,
        PoolModule,
        ShareModule,
        PlansModule.forRoot({ workerFile: options.planWorkerFile }),
        ...(options.serveClient === false ? [] : [ClientStaticModule]),
      ],
      providers: [
        { provide: APP_PIPE, useClass: ZodValidationPipe },
        { provide: APP_INTERCEPTOR, useClass: ZodSerializerInterceptor },
        { provide: APP_FILTER, useClass: ApiExceptionFilter },
        { provide: APP_GUARD, useClass: JwtAuthGuard },
        { provide: APP_GUARD, useClass: RolesGuard },
      ],
    };
  }
}
