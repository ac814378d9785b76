import { spawn, spawnSync, type ChildProcess } from 'node:child_process';
import { mkdtempSync, rmSync } from 'node:fs';
import { createServer } from 'node:net';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import type { TestProject } from 'vitest/node';
import { findChromium } from './chromium';

declare module 'vitest' {
  export interface ProvidedContext {
    baseUrl: string;
    chromiumPath: string;
  }
}

const repoRoot = resolve(__dirname, '..');
/** How long the built app may take to answer its health route on a cold start (PGlite init is ~5 s here). */
const appStartTimeoutMs = 90_000;

function freePort(): Promise<number> {
  return new Promise((done, fail) => {
    const server = createServer();
    server.once('error', fail);
    server.listen(0, '127.0.0.1', () => {
      const address = server.address();
      const port = typeof address === 'object' && address ? address.port : 0;
      server.close(() => done(port));
    });
  });
}

async function waitForHealth(baseUrl: string, app: ChildProcess): Promise<void> {
  const deadline = Date.now() + appStartTimeoutMs;
  while (Date.now() < deadline) {
    if (app.exitCode !== null) throw new Error(`the app exited with code ${app.exitCode} before it was ready`);
    try {
      const response = await fetch(`${baseUrl}/api/health`);
      if (response.ok) return;
    } catch {
      // not listening yet
    }
    await new Promise((r) => setTimeout(r, 250));
  }
  throw new Error(`the app did not answer ${baseUrl}/api/health within ${appStartTimeoutMs} ms`);
}

/**
 * Builds the real app once, starts it on a free port with a throwaway data folder (so the demo scenario is
 * seeded fresh), and hands the URL to every browser test. Without Chromium the tests skip loudly — except
 * under CI, where a missing browser is a failure.
 */
export default async function setup(project: TestProject): Promise<() => Promise<void>> {
  const chromiumPath = findChromium();
  if (!chromiumPath) {
    if (process.env.CI === 'true') throw new Error('CI=true but Chromium is missing: apt-get install -y chromium');
    console.warn('\n\n  !!! BROWSER TESTS SKIPPED: Chromium not found (apt-get install -y chromium) !!!\n\n');
    project.provide('baseUrl', '');
    project.provide('chromiumPath', '');
    return async () => {};
  }

  if (process.env.E2E_SKIP_BUILD !== '1') {
    const build = spawnSync('npm', ['run', 'build'], { cwd: repoRoot, stdio: 'inherit' });
    if (build.status !== 0) throw new Error('npm run build failed');
  }

  const dataDir = mkdtempSync(join(tmpdir(), 'gramwatt-e2e-'));
  const port = await freePort();
  const baseUrl = `http://127.0.0.1:${port}`;
  const app = spawn(process.execPath, ['scripts/start.mjs'], {
    cwd: repoRoot,
    env: {
      ...process.env,
      PORT: String(port),
      DATA_DIR: dataDir,
      NODE_ENV: 'test',
      HOST: '127.0.0.1',
      // Every browser test signs in from 127.0.0.1 against this one app, more often than the sign-in limit allows a
      // single client; the limit itself is tested in server/test/auth.e2e-spec.ts.
      AUTH_RATE_LIMIT: '1000',
    },
    stdio: ['ignore', 'inherit', 'inherit'],
  });
  await waitForHealth(baseUrl, app);

  project.provide('baseUrl', baseUrl);
  project.provide('chromiumPath', chromiumPath);
  return async () => {
    app.kill('SIGTERM');
    await new Promise((r) => (app.exitCode !== null ? r(null) : app.once('exit', r)));
    rmSync(dataDir, { recursive: true, force: true });
  };
}
