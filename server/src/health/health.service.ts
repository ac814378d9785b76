import { Inject, Injectable, Logger } from '@nestjs/common';
import { sql } from 'drizzle-orm';
import { serverVersion } from '../common/server-version';
import { DRIZZLE, type Database } from '../database/database.types';
import type { Health } from './health.dto';
import { errorMessage } from '../common/error-message';

/** How long the database may take to answer `select 1` before it counts as down, in milliseconds. */
export const databaseProbeTimeoutMs = 2_000;

@Injectable()
export class HealthService {
  private readonly logger = new Logger('Health');

  constructor(@Inject(DRIZZLE) private readonly db: Database) {}

  async check(): Promise<Health> {
    const up = await this.probeDatabase();
    return { status: up ? 'ok' : 'degraded', database: up ? 'up' : 'down', version: serverVersion };
  }

  private async probeDatabase(): Promise<boolean> {
    let timer: NodeJS.Timeout | undefined;
    const timeout = new Promise<never>((_, reject) => {
      timer = setTimeout(() => reject(new Error(`no answer in ${databaseProbeTimeoutMs} ms`)), databaseProbeTimeoutMs);
    });
    try {
      await Promise.race([this.db.execute(sql`select 1`), timeout]);
      return true;
    } catch (error) {
      this.logger.warn(`Database probe failed: ${errorMessage(error)}`);
      return false;
    } finally {
      clearTimeout(timer);
    }
  }
}
