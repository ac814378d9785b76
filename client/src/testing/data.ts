import type { Account } from '@gramwatt/shared';

/** Invented test accounts (not the demo scenario). */
export const testPassword = 'long-enough-passphrase';

let nextId = 1;
const uuidFor = (n: number) => `00000000-0000-4000-8000-${String(n).padStart(12, '0')}`;

export const buildAccount = (overrides: Partial<Account> = {}): Account => {
  const n = nextId++;
  return {
    id: uuidFor(n),
    email: `walker${n}@example.test`,
    displayName: `Walker ${n}`,
    role: 'member',
    disabled: false,
    createdAt: '2026-03-14T09:30:00.000Z',
    ...overrides,
  };
};
