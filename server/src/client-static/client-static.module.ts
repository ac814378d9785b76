import { existsSync } from 'node:fs';
import { join } from 'node:path';
import { Logger, Module } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { ServeStaticModule, type ServeStaticModuleOptions } from '@nestjs/serve-static';
import type { AppConfig } from '../config';

/** Paths the built client never answers: the API (its unknown routes get the API's 404). */
export const clientExcludedPaths = ['/api', '/api/{*path}'];

/** Serve-static options for the built client, or none (with a log line) when it has not been built. */
export function clientStaticOptions(clientDistDir: string): ServeStaticModuleOptions[] {
  const logger = new Logger('ClientStatic');
  if (!existsSync(join(clientDistDir, 'index.html'))) {
    logger.warn(`No built client at ${clientDistDir}; serving the API only (run npm run build -w client)`);
    return [];
  }
  logger.log(`Serving the client from ${clientDistDir}`);
  return [
    {
      rootPath: clientDistDir,
      exclude: clientExcludedPaths,
      serveStaticOptions: { index: false, setHeaders: setCacheHeaders },
    },
  ];
}

/**
 * Vite's content-hashed files under `assets/` never change, so they may be cached for a year; everything
 * else (index.html above all) is revalidated so a new build is picked up.
 */
function setCacheHeaders(response: { setHeader(name: string, value: string): void }, path: string): void {
  const hashed = /[\\/]assets[\\/]/.test(path);
  response.setHeader('Cache-Control', hashed ? 'public, max-age=31536000, immutable' : 'no-cache');
}

/** The built client at `/`, with the SPA fallback to index.html for any non-API path. */
@Module({
  imports: [
    ServeStaticModule.forRootAsync({
      inject: [ConfigService],
      useFactory: (config: ConfigService) => clientStaticOptions(config.getOrThrow<AppConfig>('app').clientDistDir),
    }),
  ],
})
export class ClientStaticModule {}
