import { randomBytes } from 'node:crypto';
import { chmodSync, mkdirSync, readFileSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import type { NodeEnv } from './env';

/** File in the data folder that keeps the generated development secret across restarts. */
export const jwtSecretFileName = 'jwt-secret';

/** Shortest JWT secret accepted, in characters: 32 characters of an HS256 key (RFC 7518 §3.2 asks for ≥ 256 bits). */
export const minJwtSecretLength = 32;

/** Random bytes in a generated secret: 48 bytes = 384 bits, above the RFC 7518 §3.2 minimum for HS256. */
const generatedSecretBytes = 48;

export interface JwtSecretSource {
  /** JWT_SECRET as given (already trimmed), if any. */
  configured: string | undefined;
  nodeEnv: NodeEnv;
  dataDir: string;
}

/**
 * The secret that signs session tokens. JWT_SECRET wins; production refuses to start without it;
 * elsewhere a random secret is generated once and kept in `<dataDir>/jwt-secret` (mode 0600) so
 * sessions survive a restart.
 */
export function resolveJwtSecret({ configured, nodeEnv, dataDir }: JwtSecretSource): string {
  if (configured !== undefined) return configured;
  if (nodeEnv === 'production') {
    throw new Error(
      `Invalid auth configuration:\n  JWT_SECRET: must be set in production (at least ${minJwtSecretLength} characters)`,
    );
  }
  const file = join(dataDir, jwtSecretFileName);
  const existing = readSecretFile(file);
  if (existing !== undefined) return existing;
  mkdirSync(dataDir, { recursive: true });
  const secret = randomBytes(generatedSecretBytes).toString('base64url');
  try {
    writeFileSync(file, `${secret}\n`, { mode: 0o600, flag: 'wx' });
  } catch (error) {
    // Another process created it first: use theirs.
    if (isErrnoCode(error, 'EEXIST')) return readSecretFile(file) ?? secret;
    throw error;
  }
  chmodSync(file, 0o600);
  return secret;
}

function readSecretFile(file: string): string | undefined {
  try {
    const text = readFileSync(file, 'utf8').trim();
    if (text.length < minJwtSecretLength) {
      throw new Error(
        `${file} holds a secret shorter than ${minJwtSecretLength} characters; delete it to generate a new one`,
      );
    }
    return text;
  } catch (error) {
    if (isErrnoCode(error, 'ENOENT')) return undefined;
    throw error;
  }
}

function isErrnoCode(error: unknown, code: string): boolean {
  return error instanceof Error && (error as NodeJS.ErrnoException).code === code;
}
