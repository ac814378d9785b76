import { describe, expect, it } from 'vitest';
import { hashPassword, verifyPassword } from './password';

/**
 * Known answers of the Argon2 reference implementation: phc-winner-argon2, `src/test.c`, Argon2id
 * v=0x13 cases (password "password", salt "somesalt"): t=2, m=2^8 KiB, p=1.
 */
const referenceArgon2idHash = '$argon2id$v=19$m=256,t=2,p=1$c29tZXNhbHQ$nf65EOgLrQMR/uIPnA4rEsF5h7TKyQwu9U1bMCHGi/4';

describe('password hashing', () => {
  it('accepts a hash made by the Argon2 reference implementation and rejects a wrong password', async () => {
    await expect(verifyPassword(referenceArgon2idHash, 'password')).resolves.toBe(true);
    await expect(verifyPassword(referenceArgon2idHash, 'differentpassword')).resolves.toBe(false);
  });

  it('hashes with argon2id at the OWASP cost (m=19456 KiB, t=2, p=1) and a fresh salt', async () => {
    const first = await hashPassword('trail mix and a long password');
    const second = await hashPassword('trail mix and a long password');
    expect(first).toMatch(/^\$argon2id\$v=19\$m=19456,t=2,p=1\$[A-Za-z0-9+/]{22}\$[A-Za-z0-9+/]{43}$/);
    expect(second).not.toBe(first);
    await expect(verifyPassword(first, 'trail mix and a long password')).resolves.toBe(true);
    await expect(verifyPassword(first, 'trail mix and a long passwore')).resolves.toBe(false);
  });

  it('answers false, not an error, for a malformed hash', async () => {
    await expect(verifyPassword('not-a-phc-string', 'password')).resolves.toBe(false);
    await expect(verifyPassword('', 'password')).resolves.toBe(false);
  });
});
