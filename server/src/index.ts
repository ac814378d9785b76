/**
 * @gramwatt/server — the NestJS API. The start script, the seed and the tests use these entry points
 * so every path through the app is set up the same way.
 */
export { AppModule, type AppModuleOptions } from './app.module';
export { apiPrefix, configureApp, createApp, type CreateAppOptions } from './create-app';
export { CLOCK, type Clock, systemClock } from './common/clock';
export { hashPassword, verifyPassword } from './auth/password';
export {
  type AppConfig,
  type AuthConfig,
  type DatabaseConfig,
  type Env,
  readAppConfig,
  readAuthConfig,
  readDatabaseConfig,
} from './config';
export {
  type AccountRow,
  type CreateDatabaseOptions,
  type Database,
  type DatabaseHandle,
  DRIZZLE,
  type NewAccountRow,
  createDatabase,
  migrateDatabase,
  migrationsFolder,
  schema,
} from './database';
export { tripRowValues } from './trips/trip-values';
