import { type LoggerService, type LogLevel } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { NestFactory } from '@nestjs/core';
import type { NestExpressApplication } from '@nestjs/platform-express';
import cookieParser from 'cookie-parser';
import { AppModule, type AppModuleOptions } from './app.module';
import { translateBodyParserErrors } from './common/body-parser-errors';
import { securityHeaders } from './common/security-headers';
import type { AppConfig, AuthConfig } from './config';
import { setUpOpenApi } from './docs/openapi';

/** The URL prefix of every API route. */
export const apiPrefix = 'api';

export interface CreateAppOptions extends AppModuleOptions {
  /** Nest logger: a logger, the levels to print, or false for silence (tests). Default: log, warn, error. */
  logger?: LoggerService | LogLevel[] | false;
}

/**
 * Builds and initialises the whole app — config, database, guards, pipes, the error filter, cookies,
 * OpenAPI docs, the static client — exactly as `main.ts`, the tests and the start script use it.
 * Call `listen(port)` on the result to serve; `close()` to stop (closes a database it opened itself).
 *
 * @example
 * const { db, close } = await createDatabase({ dataDir: './data' });
 * await migrateDatabase(db);
 * const app = await createApp({ database: db });
 * await app.listen(3000);
 */
export async function createApp(options: CreateAppOptions = {}): Promise<NestExpressApplication> {
  const { logger = ['log', 'warn', 'error'], ...moduleOptions } = options;
  const app = await NestFactory.create<NestExpressApplication>(AppModule.forRoot(moduleOptions), {
    logger,
    abortOnError: false,
  });
  configureApp(app);
  await app.init();
  return app;
}

/**
 * The app-level setup `createApp` applies before `init()`: body parsers with plain errors, cookies, the
 * `api` prefix and the OpenAPI document. Exported for tests that build the module with
 * `Test.createTestingModule` (and override `DRIZZLE`) instead of `createApp`.
 */
export function configureApp(app: NestExpressApplication): void {
  app.disable('x-powered-by');
  const { trustProxyHops } = app.get(ConfigService).getOrThrow<AppConfig>('app');
  // Behind N reverse proxies, req.ip (the rate limit's key) comes from X-Forwarded-For.
  if (trustProxyHops > 0) app.set('trust proxy', trustProxyHops);
  app.use(securityHeaders());
  // Register the body parsers now (init() then skips its own) so the translator can follow them.
  app.useBodyParser('json');
  app.useBodyParser('urlencoded', { extended: true });
  app.use(translateBodyParserErrors);
  app.use(cookieParser());
  app.setGlobalPrefix(apiPrefix);
  const auth = app.get(ConfigService).getOrThrow<AuthConfig>('auth');
  setUpOpenApi(app, auth.cookieName);
}
