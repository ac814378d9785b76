import type { TripRole } from '@gramwatt/shared';

/**
 * What each trip role may do: the one table every trip route is checked against (through
 * `TripAccessGuard` and `@TripPermission`). Later features add their actions here (plans, kit, invites,
 * share links), so the rule for who may do what lives in one place.
 */
export const tripPermissions = {
  readTrip: ['leader', 'partner', 'viewer'],
  updateTrip: ['leader'],
  deleteTrip: ['leader'],
  readMembers: ['leader', 'partner', 'viewer'],
  readDevices: ['leader', 'partner', 'viewer'],
  /** Adds one of the caller's own locker devices. */
  addDevice: ['leader', 'partner'],
  /** Changes or removes a device: a partner only their own (checked by the devices service), the leader any. */
  changeDevice: ['leader', 'partner'],
  readPool: ['leader', 'partner', 'viewer'],
  /** Shares one of the caller's own locker items into the party pool. */
  shareToPool: ['leader', 'partner'],
  /** Changes the count of a pooled item or takes it out: a partner only their own (checked by the pool service), the leader any. */
  changePoolItem: ['leader', 'partner'],
  /** Reads the trip's plans and its chosen kit. */
  readPlans: ['leader', 'partner', 'viewer'],
  /** Solves and stores a plan. */
  runPlan: ['leader', 'partner'],
  /** Simulates a kit picked by hand (nothing is stored). */
  checkKit: ['leader', 'partner'],
  /** Stores the chosen kit the packing list and the e-mails use. */
  chooseKit: ['leader'],
  /** Changes a member's role or gram limit, or removes them. */
  manageMembers: ['leader'],
  /** Invites by e-mail, lists and withdraws invites. */
  manageInvites: ['leader'],
  /** Makes, shows and revokes the read-only share link. */
  manageShareLink: ['leader'],
  /** E-mails the trip summary and share link to the viewers. */
  sendHome: ['leader'],
} as const satisfies Record<string, readonly TripRole[]>;

/** An action on a trip, as named in {@link tripPermissions}. */
export type TripPermission = keyof typeof tripPermissions;

/** The roles that may do `permission`. */
export function rolesFor(permission: TripPermission): readonly TripRole[] {
  return tripPermissions[permission];
}
