import { hash, verify } from '@node-rs/argon2';

/**
 * argon2id cost parameters: 19 MiB of memory, 2 passes, 1 lane — the first configuration in the OWASP
 * Password Storage Cheat Sheet ("Argon2id", minimum recommended settings). @node-rs/argon2 uses
 * argon2id by default (RFC 9106 §4 recommends it as the default variant).
 */
export const argon2Options = {
  /** Memory cost in KiB (19 MiB). */
  memoryCost: 19_456,
  /** Passes over memory. */
  timeCost: 2,
  /** Lanes (threads). */
  parallelism: 1,
} as const;

/**
 * Hashes a password with argon2id and a fresh random salt, as a PHC string (`$argon2id$v=19$m=19456,t=2,p=1$…`).
 * Exported for the seed, which creates accounts without HTTP.
 *
 * @example
 * const passwordHash = await hashPassword('correct horse battery');
 */
export function hashPassword(password: string): Promise<string> {
  return hash(password, argon2Options);
}

/** Whether `password` matches the PHC string `passwordHash`; false (never a throw) for a malformed hash. */
export async function verifyPassword(passwordHash: string, password: string): Promise<boolean> {
  try {
    return await verify(passwordHash, password);
  } catch {
    return false;
  }
}
