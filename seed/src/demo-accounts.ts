import type { AccountRole } from '@gramwatt/shared';

/**
 * The invented people of the demo scenario. The `.example` top-level domain is reserved for examples
 * (RFC 2606), so no demo message can ever reach a real mailbox.
 */
export interface DemoAccount {
  email: string;
  displayName: string;
  role: AccountRole;
}

export const demoAccounts: readonly DemoAccount[] = [
  { email: 'warden@gramwatt.example', displayName: 'Demo Warden', role: 'admin' },
  { email: 'fern@gramwatt.example', displayName: 'Fern Altmoor', role: 'member' },
  { email: 'tobin@gramwatt.example', displayName: 'Tobin Quarry', role: 'member' },
  // The contact at home: a viewer on the demo party's trip, who receives the plan by e-mail.
  { email: 'hollis@gramwatt.example', displayName: 'Hollis Brae', role: 'member' },
];

/**
 * The demo password, printed on start. It protects only the local demo database; `DEMO_PASSWORD` overrides it.
 */
export const demoPassword = process.env.DEMO_PASSWORD ?? 'switchback-demo-7';
