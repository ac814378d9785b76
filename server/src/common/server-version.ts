import { readFileSync } from 'node:fs';
import { resolve } from 'node:path';

/**
 * The server package's version, read once from `server/package.json` (`server/src/common` and
 * `server/dist/common` are both two levels below it).
 */
export const serverVersion: string = (() => {
  try {
    const text = readFileSync(resolve(__dirname, '../../package.json'), 'utf8');
    const version: unknown = (JSON.parse(text) as { version?: unknown }).version;
    return typeof version === 'string' ? version : '0.0.0';
  } catch {
    return '0.0.0';
  }
})();
