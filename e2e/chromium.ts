import { existsSync } from 'node:fs';

/**
 * Where Debian's chromium package puts the real browser binary. `/usr/bin/chromium` is a shell wrapper
 * that prints noise and adds flags of its own, so the browser tests launch the binary behind it.
 */
const debianChromiumPath = '/usr/lib/chromium/chromium';

/** The Chromium binary to drive, or null when none is installed. `CHROMIUM_PATH` overrides. */
export function findChromium(): string | null {
  const candidates = [process.env.CHROMIUM_PATH, debianChromiumPath].filter((p): p is string => Boolean(p));
  return candidates.find((p) => existsSync(p)) ?? null;
}

/**
 * Flags for headless Chromium as root in a sandbox without a GPU or network: no sandbox, no GPU, no /dev/shm,
 * and no background connections (they are refused here and would only slow each start).
 */
export const chromiumArgs = [
  '--headless',
  '--no-sandbox',
  '--disable-gpu',
  '--disable-dev-shm-usage',
  '--disable-background-networking',
  '--disable-component-update',
  '--disable-sync',
  '--no-first-run',
];
