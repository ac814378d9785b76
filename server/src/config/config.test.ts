import { mkdtempSync, readFileSync, rmSync, statSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { readAppConfig } from './app.config';
import { readAuthConfig } from './auth.config';
import { readDatabaseConfig } from './database.config';

const secret = 's'.repeat(40);

describe('config validation', () => {
  let dataDir: string;

  beforeEach(() => {
    dataDir = mkdtempSync(join(tmpdir(), 'gramwatt-config-'));
  });

  afterEach(() => {
    rmSync(dataDir, { recursive: true, force: true });
  });

  describe('app', () => {
    it('defaults to port 3000, ./data and development', () => {
      const config = readAppConfig({});
      expect(config.port).toBe(3000);
      expect(config.nodeEnv).toBe('development');
      expect(config.dataDir).toBe(resolve('./data'));
      expect(config.clientDistDir).toMatch(/client[\\/]dist$/);
    });

    it('treats an empty variable as unset', () => {
      expect(readAppConfig({ PORT: '', DATA_DIR: '  ' }).port).toBe(3000);
    });

    it('reads PORT, DATA_DIR and CLIENT_DIST_DIR', () => {
      const config = readAppConfig({ PORT: '8080', DATA_DIR: dataDir, CLIENT_DIST_DIR: '/srv/client' });
      expect(config).toMatchObject({ port: 8080, dataDir, clientDistDir: '/srv/client' });
    });

    it.each([['eighty'], ['-1'], ['70000'], ['80.5']])('rejects PORT=%s, naming the variable', (port) => {
      expect(() => readAppConfig({ PORT: port })).toThrow(/PORT/);
    });

    it('reads TRUST_PROXY_HOPS (default 0) and rejects a negative count', () => {
      expect(readAppConfig({}).trustProxyHops).toBe(0);
      expect(readAppConfig({ TRUST_PROXY_HOPS: '1' }).trustProxyHops).toBe(1);
      expect(() => readAppConfig({ TRUST_PROXY_HOPS: '-1' })).toThrow(/TRUST_PROXY_HOPS/);
    });

    it('rejects an unknown NODE_ENV', () => {
      expect(() => readAppConfig({ NODE_ENV: 'staging' })).toThrow(/NODE_ENV/);
    });
  });

  describe('auth', () => {
    it('refuses to start in production without JWT_SECRET', () => {
      expect(() => readAuthConfig({ NODE_ENV: 'production', DATA_DIR: dataDir })).toThrow(
        /JWT_SECRET: must be set in production/,
      );
    });

    it('refuses a short JWT_SECRET', () => {
      expect(() => readAuthConfig({ NODE_ENV: 'production', JWT_SECRET: 'short', DATA_DIR: dataDir })).toThrow(
        /JWT_SECRET: must have at least 32 characters/,
      );
    });

    it('uses JWT_SECRET when given and writes no file', () => {
      const config = readAuthConfig({ NODE_ENV: 'production', JWT_SECRET: secret, DATA_DIR: dataDir });
      expect(config.jwtSecret).toBe(secret);
      expect(() => statSync(join(dataDir, 'jwt-secret'))).toThrow();
    });

    it('outside production generates a secret once, keeps it with mode 0600 and reuses it', () => {
      const first = readAuthConfig({ DATA_DIR: dataDir });
      const file = join(dataDir, 'jwt-secret');
      expect(first.jwtSecret.length).toBeGreaterThanOrEqual(32);
      expect(statSync(file).mode & 0o777).toBe(0o600);
      expect(readFileSync(file, 'utf8').trim()).toBe(first.jwtSecret);
      expect(readAuthConfig({ DATA_DIR: dataDir }).jwtSecret).toBe(first.jwtSecret);
    });

    it('refuses a kept secret file that is too short', () => {
      writeFileSync(join(dataDir, 'jwt-secret'), 'tiny\n');
      expect(() => readAuthConfig({ DATA_DIR: dataDir })).toThrow(/shorter than 32/);
    });

    it('makes the cookie Secure in production only, unless told otherwise', () => {
      expect(readAuthConfig({ JWT_SECRET: secret }).cookieSecure).toBe(false);
      expect(readAuthConfig({ NODE_ENV: 'production', JWT_SECRET: secret }).cookieSecure).toBe(true);
      expect(
        readAuthConfig({ NODE_ENV: 'production', JWT_SECRET: secret, AUTH_COOKIE_SECURE: 'false' }).cookieSecure,
      ).toBe(false);
      expect(() => readAuthConfig({ JWT_SECRET: secret, AUTH_COOKIE_SECURE: 'maybe' })).toThrow(/AUTH_COOKIE_SECURE/);
    });

    it('has defaults for lifetime, cookie name and rate limit, and validates them', () => {
      expect(readAuthConfig({ JWT_SECRET: secret })).toMatchObject({
        tokenLifetimeS: 604_800,
        cookieName: 'gramwatt_session',
        rateLimit: 10,
        rateWindowS: 60,
      });
      expect(() => readAuthConfig({ JWT_SECRET: secret, AUTH_TOKEN_LIFETIME_S: '0' })).toThrow(/AUTH_TOKEN_LIFETIME_S/);
      expect(() => readAuthConfig({ JWT_SECRET: secret, AUTH_COOKIE_NAME: 'bad name;' })).toThrow(/AUTH_COOKIE_NAME/);
      expect(() => readAuthConfig({ JWT_SECRET: secret, AUTH_RATE_LIMIT: 'lots' })).toThrow(/AUTH_RATE_LIMIT/);
    });
  });

  describe('database', () => {
    it('uses PGlite in DATA_DIR/pglite when DATABASE_URL is unset', () => {
      expect(readDatabaseConfig({ DATA_DIR: dataDir })).toEqual({ url: undefined, pgliteDir: join(dataDir, 'pglite') });
    });

    it('accepts postgres:// and postgresql:// URLs and rejects others', () => {
      expect(readDatabaseConfig({ DATABASE_URL: 'postgres://u:p@localhost:5432/gw' }).url).toBe(
        'postgres://u:p@localhost:5432/gw',
      );
      expect(readDatabaseConfig({ DATABASE_URL: 'postgresql://localhost/gw' }).url).toBe('postgresql://localhost/gw');
      expect(() => readDatabaseConfig({ DATABASE_URL: 'mysql://localhost/gw' })).toThrow(/DATABASE_URL/);
    });
  });
});
