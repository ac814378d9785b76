import { execFileSync } from 'node:child_process';
import { chownSync, existsSync, mkdtempSync, readdirSync, rmSync } from 'node:fs';
import { createServer } from 'node:net';
import { tmpdir } from 'node:os';
import { join } from 'node:path';

/** A PostgreSQL cluster made for one test file and thrown away after it. */
export interface ThrowawayPostgres {
  url: string;
  stop(): Promise<void>;
}

/** Where Debian's `postgresql` package puts the server binaries, newest version first. */
function findPgBin(): string | undefined {
  const root = '/usr/lib/postgresql';
  if (!existsSync(root)) return undefined;
  const versions = readdirSync(root).sort((a, b) => Number(b) - Number(a));
  for (const version of versions) {
    const bin = join(root, version, 'bin');
    if (existsSync(join(bin, 'initdb')) && existsSync(join(bin, 'pg_ctl'))) return bin;
  }
  return undefined;
}

function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const server = createServer();
    server.once('error', reject);
    server.listen(0, '127.0.0.1', () => {
      const address = server.address();
      const port = typeof address === 'object' && address ? address.port : 0;
      server.close(() => resolve(port));
    });
  });
}

function idOf(user: string, flag: '-u' | '-g'): number | undefined {
  try {
    return Number(execFileSync('id', [flag, user], { encoding: 'utf8' }).trim());
  } catch {
    return undefined;
  }
}

/** Whether a cluster can be started here (or `GRAMWATT_TEST_DATABASE_URL` names one), and if not why. */
export function postgresAvailable(): { ok: true } | { ok: false; reason: string } {
  if (process.env.GRAMWATT_TEST_DATABASE_URL) return { ok: true };
  if (!findPgBin()) return { ok: false, reason: 'PostgreSQL is not installed (apt-get install -y postgresql)' };
  if (process.getuid?.() === 0 && idOf('postgres', '-u') === undefined) {
    return { ok: false, reason: 'running as root but there is no postgres user to run the cluster as' };
  }
  return { ok: true };
}

/**
 * Starts a throwaway cluster (`initdb` + `pg_ctl`, trust auth, TCP on 127.0.0.1 and a free port); check
 * {@link postgresAvailable} first. `GRAMWATT_TEST_DATABASE_URL`
 * points the tests at an existing server instead. PostgreSQL refuses to run as root, so as root the
 * cluster runs as the `postgres` user.
 */
export async function startThrowawayPostgres(): Promise<ThrowawayPostgres> {
  const given = process.env.GRAMWATT_TEST_DATABASE_URL;
  if (given) return { url: given, stop: async () => undefined };

  const bin = findPgBin();
  if (!bin) throw new Error('PostgreSQL is not installed');
  const asRoot = process.getuid?.() === 0;
  const uid = asRoot ? idOf('postgres', '-u') : undefined;
  const gid = asRoot ? idOf('postgres', '-g') : undefined;
  const run = (command: string, args: string[]) =>
    asRoot
      ? execFileSync('runuser', ['-u', 'postgres', '--', join(bin, command), ...args], { stdio: 'pipe' })
      : execFileSync(join(bin, command), args, { stdio: 'pipe' });

  const dir = mkdtempSync(join(tmpdir(), 'gramwatt-pg-'));
  if (asRoot && uid !== undefined && gid !== undefined) chownSync(dir, uid, gid);
  const dataDir = join(dir, 'data');
  const port = await freePort();
  run('initdb', ['-D', dataDir, '-A', 'trust', '-U', 'postgres', '--no-sync']);
  run('pg_ctl', [
    '-D',
    dataDir,
    '-l',
    join(dir, 'server.log'),
    '-o',
    `-p ${port} -k ${dir} -c listen_addresses=127.0.0.1 -c fsync=off`,
    '-w',
    'start',
  ]);
  return {
    url: `postgres://postgres@127.0.0.1:${port}/postgres`,
    stop: async () => {
      try {
        run('pg_ctl', ['-D', dataDir, '-m', 'immediate', '-w', 'stop']);
      } finally {
        rmSync(dir, { recursive: true, force: true });
      }
    },
  };
}
