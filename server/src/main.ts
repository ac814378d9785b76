import { Logger } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import type { AppConfig } from './config';
import { createApp } from './create-app';

/** Starts the server on PORT (default 3000) with the database from config (PGlite in DATA_DIR unless DATABASE_URL). */
async function main(): Promise<void> {
  const startedAt = performance.now();
  const app = await createApp();
  app.enableShutdownHooks();
  const { port, host } = app.get(ConfigService).getOrThrow<AppConfig>('app');
  if (host) await app.listen(port, host);
  else await app.listen(port);
  const url = `http://${host ?? 'localhost'}:${port}`;
  new Logger('Main').log(`Gramwatt listening on ${url} (ready in ${Math.round(performance.now() - startedAt)} ms)`);
}

main().catch((error: unknown) => {
  console.error(error instanceof Error ? (error.stack ?? error.message) : error);
  process.exit(1);
});
