import { createHash, randomBytes } from 'node:crypto';

/** Random bytes in an invite token: 32 bytes = 256 bits, far beyond guessing, so a plain SHA-256 suffices to store it. */
const inviteTokenBytes = 32;

/** A token as it appears in a link: 43 base64url characters (32 bytes). */
export const inviteTokenPattern = /^[A-Za-z0-9_-]{43}$/;

/** Hex SHA-256 of a token: what the database keeps. */
export function hashInviteToken(token: string): string {
  return createHash('sha256').update(token, 'utf8').digest('hex');
}

/** A new random token and its hash. */
export function newInviteToken(): { token: string; tokenHash: string } {
  const token = randomBytes(inviteTokenBytes).toString('base64url');
  return { token, tokenHash: hashInviteToken(token) };
}
