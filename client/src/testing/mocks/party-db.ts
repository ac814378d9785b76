import type {
  Account,
  Invite,
  PoolItem,
  MailDelivery,
  OutboxMessage,
  SharedTrip,
  ShareLink,
  TripMember,
  TripRole,
} from '@gramwatt/shared';

/** An invite as the fake server keeps it: the leader's view plus what only the e-mail carries. */
export interface MockInvite extends Invite {
  tripId: string;
  token: string;
}

/** The fake server's party state: trips' members, invites, share links, the local outbox and mail delivery. */
interface PartyDb {
  tripNames: Map<string, string>;
  members: Map<string, TripMember[]>;
  invites: MockInvite[];
  shareLinks: Map<string, ShareLink>;
  /** What each share token opens, or the status and message it answers with. */
  sharedTrips: Map<string, SharedTrip | { status: 404 | 410; message: string }>;
  outboxLocal: boolean;
  outbox: OutboxMessage[];
  deliveries: MailDelivery[];
  /** Each trip's pooled gear. */
  pool: Map<string, PoolItem[]>;
}

const empty = (): PartyDb => ({
  tripNames: new Map(),
  members: new Map(),
  invites: [],
  shareLinks: new Map(),
  sharedTrips: new Map(),
  outboxLocal: false,
  outbox: [],
  deliveries: [],
  pool: new Map(),
});

export const partyDb: PartyDb = empty();

export const resetPartyDb = () => Object.assign(partyDb, empty());

let nextId = 1;
/** Ids in their own range (…-9xxxxxxxxxxx) so they never meet the account ids of `buildAccount`. */
export const partyId = () => `00000000-0000-4000-8000-9${String(nextId++).padStart(11, '0')}`;

const joinedAt = '2026-05-01T08:00:00.000Z';

/** A trip the fake server knows, with these accounts on it in these roles (the first should be the leader). */
export const seedPartyTrip = (
  name: string,
  people: ReadonlyArray<{ account: Account; role: TripRole; gramLimitG?: number | null }>,
): string => {
  const tripId = partyId();
  partyDb.tripNames.set(tripId, name);
  partyDb.members.set(
    tripId,
    people.map(({ account, role, gramLimitG = null }) => ({
      accountId: account.id,
      displayName: account.displayName,
      email: account.email,
      role,
      gramLimitG,
      joinedAt,
    })),
  );
  partyDb.shareLinks.set(tripId, { state: 'none', url: null, path: null, createdAt: null, expiresAt: null });
  return tripId;
};

/** A pending invite with a known token, as if the leader had sent it. */
export const seedInvite = (tripId: string, email: string, role: 'partner' | 'viewer', token = `tok-${partyId()}`) => {
  const invite: MockInvite = {
    id: partyId(),
    tripId,
    token,
    email,
    role,
    state: 'pending',
    invitedByName: partyDb.members.get(tripId)?.[0]?.displayName ?? 'A trip leader',
    createdAt: '2026-05-02T08:00:00.000Z',
    expiresAt: '2026-05-09T08:00:00.000Z',
    acceptedAt: null,
    mail: { status: 'sent', attempts: 1, lastError: null },
  };
  partyDb.invites.push(invite);
  return invite;
};
