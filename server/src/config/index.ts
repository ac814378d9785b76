export { type AppConfig, appConfig, appConfigKey, readAppConfig } from './app.config';
export { type AuthConfig, authConfig, authConfigKey, readAuthConfig } from './auth.config';
export { type DatabaseConfig, databaseConfig, databaseConfigKey, readDatabaseConfig } from './database.config';
export { type Env, type NodeEnv } from './env';
export {
  type S3Settings,
  type StorageConfig,
  type StorageDriver,
  readStorageConfig,
  storageConfig,
  storageConfigKey,
} from './storage.config';
