import {
  type DynamicModule,
  Global,
  Logger,
  Module,
  type OnApplicationShutdown,
  type OnModuleInit,
} from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import type { AppConfig, DatabaseConfig } from '../config';
import { createDatabase } from './create-database';
import { DRIZZLE, type Database } from './database.types';
import { migrateDatabase } from './migrate-database';

export interface DatabaseModuleOptions {
  /** A database the caller opened (and will close); when absent the module opens one from config and closes it on shutdown. */
  database?: Database;
}

/** Migrates the database at start and closes it at shutdown when this module opened it. */
export class DatabaseLifecycle implements OnModuleInit, OnApplicationShutdown {
  private readonly logger = new Logger('Database');
  private closeOwned: (() => Promise<void>) | undefined;

  constructor(private readonly db: Database) {}

  /** Records how to close a database this module opened. */
  own(close: () => Promise<void>): void {
    this.closeOwned = close;
  }

  /** Migrations run before the app takes requests; a failure stops the start. */
  async onModuleInit(): Promise<void> {
    await migrateDatabase(this.db);
    this.logger.log('Migrations applied');
  }

  async onApplicationShutdown(): Promise<void> {
    await this.closeOwned?.();
  }
}

/** Whoever opened the database registers its close here before `DatabaseLifecycle` exists. */
const pendingClose = new WeakMap<Database, () => Promise<void>>();

@Global()
@Module({})
export class DatabaseModule {
  /** Provides `DRIZZLE`: the given database, or PGlite in DATA_DIR/pglite, or PostgreSQL when DATABASE_URL is set. */
  static forRoot(options: DatabaseModuleOptions = {}): DynamicModule {
    return {
      module: DatabaseModule,
      providers: [
        {
          provide: DRIZZLE,
          inject: [ConfigService],
          useFactory: async (config: ConfigService): Promise<Database> => {
            if (options.database) return options.database;
            const { url, pgliteDir } = config.getOrThrow<DatabaseConfig>('database');
            const { dataDir } = config.getOrThrow<AppConfig>('app');
            new Logger('Database').log(
              url ? 'Using PostgreSQL from DATABASE_URL' : `Using embedded PGlite in ${pgliteDir}`,
            );
            const handle = await createDatabase(url ? { databaseUrl: url } : { dataDir });
            pendingClose.set(handle.db, handle.close);
            return handle.db;
          },
        },
        {
          provide: DatabaseLifecycle,
          inject: [DRIZZLE],
          useFactory: (db: Database) => {
            const lifecycle = new DatabaseLifecycle(db);
            const close = pendingClose.get(db);
            if (close) lifecycle.own(close);
            return lifecycle;
          },
        },
      ],
      exports: [DRIZZLE],
    };
  }
}
