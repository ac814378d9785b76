import {
  inviteCreateSchema,
  memberUpdateSchema,
  poolItemAddSchema,
  poolItemSchema,
  poolItemUpdateSchema,
  type KitItemSpec,
  type PoolItem,
  sendHomeSchema,
  shareCreateSchema,
  type OutboxMessage,
  type TripMember,
} from '@gramwatt/shared';
import { http, HttpResponse } from 'msw';
import { sessionAccount } from './db';
import { lockerDb } from './locker-db';
import { partyDb, partyId, type MockInvite } from './party-db';

const apiError = (statusCode: number, message: string, errors: Array<{ path: string; message: string }> = []) =>
  HttpResponse.json({ statusCode, message, errors }, { status: statusCode });

const validationError = (issues: Array<{ path: PropertyKey[]; message: string }>) =>
  apiError(
    400,
    'Some fields need attention',
    issues.map((issue) => ({ path: issue.path.map(String).join('.'), message: issue.message })),
  );

const publicUrl = 'http://gramwatt.test';
const fixedNow = '2026-05-03T10:00:00.000Z';

type Guard = { member: TripMember; members: TripMember[] } | { response: Response };

/** The server's trip policy in small: signed in, a member (else 404), and leader for leader's actions (else 403). */
const guard = (tripId: string, { leaderOnly = false } = {}): Guard => {
  const me = sessionAccount();
  if (!me) return { response: apiError(401, 'Sign in to continue') };
  const members = partyDb.members.get(tripId) ?? [];
  const member = members.find((m) => m.accountId === me.id);
  if (!member) return { response: apiError(404, 'Trip not found') };
  if (leaderOnly && member.role !== 'leader') return { response: apiError(403, 'Only the trip leader may do this') };
  return { member, members };
};

const inviteView = ({ tripId: _tripId, token: _token, ...invite }: MockInvite) => invite;

/** A message lands in the local outbox, with its delivery record. */
const deliver = (kind: 'trip-invite' | 'trip-plan', to: string, subject: string, text: string) => {
  const message: OutboxMessage = {
    id: partyId(),
    receivedAt: fixedNow,
    from: 'Gramwatt <mail@gramwatt.test>',
    to,
    subject,
    preview: text.slice(0, 140),
    text,
    html: `<p>${text}</p>`,
    messageId: null,
  };
  partyDb.outbox.unshift(message);
  partyDb.deliveries.unshift({
    id: message.id,
    kind,
    toAddress: to,
    status: 'sent',
    attempts: 1,
    lastError: null,
    createdAt: fixedNow,
    sentAt: fixedNow,
    nextAttemptAt: null,
  });
};

const poolableKinds: readonly string[] = poolItemSchema.shape.kind.options;

/** The pool as the server lists it: entries, and whether the leader's whole locker still counts. */
const poolList = (tripId: string, members: TripMember[]) => {
  const items = partyDb.pool.get(tripId) ?? [];
  const leaderId = members.find((m) => m.role === 'leader')?.accountId;
  return { items, leaderWholeLocker: !items.some((item) => item.ownerAccountId === leaderId) };
};

/** Finds a pool entry the caller may change: a partner only their own, the leader any. */
const changeablePoolItem = (tripId: string, poolItemId: string, member: TripMember): PoolItem | Response => {
  const item = partyDb.pool.get(tripId)?.find((entry) => entry.id === poolItemId);
  if (!item) return apiError(404, 'This item is not in the trip’s pool');
  if (member.role === 'viewer' || (member.role === 'partner' && item.ownerAccountId !== member.accountId))
    return apiError(403, 'Only its owner or the leader may change this entry');
  return item;
};

/** A fake of the party, pool, share-link and outbox routes, following the server's contract. */
export const partyHandlers = [
  http.get<{ id: string }>('*/api/trips/:id/pool', ({ params }) => {
    const access = guard(params.id);
    if ('response' in access) return access.response;
    return HttpResponse.json(poolList(params.id, access.members));
  }),

  http.post<{ id: string }>('*/api/trips/:id/pool', async ({ params, request }) => {
    const access = guard(params.id);
    if ('response' in access) return access.response;
    if (access.member.role === 'viewer') return apiError(403, 'Viewers cannot share gear');
    const parsed = poolItemAddSchema.safeParse(await request.json());
    if (!parsed.success) return validationError(parsed.error.issues);
    const item = lockerDb.items.find((i) => i.id === parsed.data.itemId && i.ownerId === access.member.accountId);
    if (!item) return apiError(404, 'No such item in your locker');
    if (!poolableKinds.includes(item.kind)) return apiError(400, 'Only power gear can be pooled');
    if (parsed.data.count > item.countOwned)
      return apiError(400, `You own ${item.countOwned} of this item`, [
        { path: 'count', message: `Count may be at most the ${item.countOwned} you own` },
      ]);
    const entries = partyDb.pool.get(params.id) ?? [];
    if (entries.some((e) => e.itemId === item.id))
      return apiError(409, 'This item is in the pool already: change its count instead');
    const entry: PoolItem = {
      id: partyId(),
      itemId: item.id,
      name: item.name,
      kind: item.kind as PoolItem['kind'],
      massG: item.massG,
      count: parsed.data.count,
      countOwned: item.countOwned,
      ownerAccountId: access.member.accountId,
      ownerName: access.member.displayName,
      spec: item.spec as KitItemSpec,
      createdAt: fixedNow,
      updatedAt: fixedNow,
    };
    partyDb.pool.set(params.id, [...entries, entry]);
    return HttpResponse.json({ item: entry }, { status: 201 });
  }),

  http.patch<{ id: string; poolItemId: string }>('*/api/trips/:id/pool/:poolItemId', async ({ params, request }) => {
    const access = guard(params.id);
    if ('response' in access) return access.response;
    const found = changeablePoolItem(params.id, params.poolItemId, access.member);
    if (found instanceof Response) return found;
    const parsed = poolItemUpdateSchema.safeParse(await request.json());
    if (!parsed.success) return validationError(parsed.error.issues);
    if (parsed.data.count > found.countOwned)
      return apiError(400, `You own ${found.countOwned} of this item`, [
        { path: 'count', message: `Count may be at most the ${found.countOwned} you own` },
      ]);
    found.count = parsed.data.count;
    return HttpResponse.json({ item: found });
  }),

  http.delete<{ id: string; poolItemId: string }>('*/api/trips/:id/pool/:poolItemId', ({ params }) => {
    const access = guard(params.id);
    if ('response' in access) return access.response;
    const found = changeablePoolItem(params.id, params.poolItemId, access.member);
    if (found instanceof Response) return found;
    partyDb.pool.set(
      params.id,
      (partyDb.pool.get(params.id) ?? []).filter((entry) => entry !== found),
    );
    return new HttpResponse(null, { status: 204 });
  }),

  http.get('*/api/outbox/status', () => HttpResponse.json({ local: partyDb.outboxLocal })),

  http.get('*/api/outbox', () => {
    const me = sessionAccount();
    if (!me) return apiError(401, 'Sign in to continue');
    if (!partyDb.outboxLocal) return apiError(404, 'The outbox is only kept while mail goes to the local fake');
    const messages = partyDb.outbox
      .filter((m) => m.to === me.email)
      .map(({ text: _t, html: _h, messageId: _m, ...entry }) => entry);
    return HttpResponse.json({ messages });
  }),

  http.get<{ messageId: string }>('*/api/outbox/:messageId', ({ params }) => {
    const me = sessionAccount();
    if (!me) return apiError(401, 'Sign in to continue');
    const message = partyDb.outbox.find((m) => m.id === params.messageId && m.to === me.email);
    return message ? HttpResponse.json({ message }) : apiError(404, 'Message not found');
  }),

  http.get('*/api/admin/mail', () => {
    const me = sessionAccount();
    if (!me) return apiError(401, 'Sign in to continue');
    if (me.role !== 'admin') return apiError(403, 'Admins only');
    return HttpResponse.json({ messages: partyDb.deliveries });
  }),

  http.get<{ id: string }>('*/api/trips/:id/members', ({ params }) => {
    const access = guard(params.id);
    if ('response' in access) return access.response;
    return HttpResponse.json({ members: access.members });
  }),

  http.patch<{ id: string; accountId: string }>('*/api/trips/:id/members/:accountId', async ({ params, request }) => {
    const access = guard(params.id, { leaderOnly: true });
    if ('response' in access) return access.response;
    const parsed = memberUpdateSchema.safeParse(await request.json());
    if (!parsed.success) return validationError(parsed.error.issues);
    const target = access.members.find((m) => m.accountId === params.accountId);
    if (!target) return apiError(404, 'Member not found');
    if (parsed.data.role !== undefined && target.role === 'leader')
      return apiError(409, 'The leader’s role cannot change');
    Object.assign(target, parsed.data);
    return HttpResponse.json({ member: target });
  }),

  http.delete<{ id: string; accountId: string }>('*/api/trips/:id/members/:accountId', ({ params }) => {
    const access = guard(params.id, { leaderOnly: true });
    if ('response' in access) return access.response;
    const target = access.members.find((m) => m.accountId === params.accountId);
    if (!target) return apiError(404, 'Member not found');
    if (target.role === 'leader') return apiError(409, 'The leader cannot be removed: delete the trip instead');
    partyDb.members.set(
      params.id,
      access.members.filter((m) => m !== target),
    );
    return new HttpResponse(null, { status: 204 });
  }),

  http.get<{ id: string }>('*/api/trips/:id/invites', ({ params }) => {
    const access = guard(params.id, { leaderOnly: true });
    if ('response' in access) return access.response;
    const invites = partyDb.invites.filter((i) => i.tripId === params.id).reverse();
    return HttpResponse.json({ invites: invites.map(inviteView) });
  }),

  http.post<{ id: string }>('*/api/trips/:id/invites', async ({ params, request }) => {
    const access = guard(params.id, { leaderOnly: true });
    if ('response' in access) return access.response;
    const parsed = inviteCreateSchema.safeParse(await request.json());
    if (!parsed.success) return validationError(parsed.error.issues);
    if (access.members.some((m) => m.email === parsed.data.email))
      return apiError(409, `${parsed.data.email} is already on this trip`);
    for (const old of partyDb.invites)
      if (old.tripId === params.id && old.email === parsed.data.email && old.state === 'pending') old.state = 'revoked';
    const token = `tok-${partyId()}`;
    const invite: MockInvite = {
      id: partyId(),
      tripId: params.id,
      token,
      ...parsed.data,
      state: 'pending',
      invitedByName: access.member.displayName,
      createdAt: fixedNow,
      expiresAt: '2026-05-10T10:00:00.000Z',
      acceptedAt: null,
      mail: { status: 'sent', attempts: 1, lastError: null },
    };
    partyDb.invites.push(invite);
    const tripName = partyDb.tripNames.get(params.id) ?? 'a trip';
    deliver(
      'trip-invite',
      invite.email,
      `${access.member.displayName} invited you to "${tripName}" on Gramwatt`,
      `Open the invite: ${publicUrl}/invites/${token}`,
    );
    return HttpResponse.json({ invite: inviteView(invite) }, { status: 201 });
  }),

  http.delete<{ id: string; inviteId: string }>('*/api/trips/:id/invites/:inviteId', ({ params }) => {
    const access = guard(params.id, { leaderOnly: true });
    if ('response' in access) return access.response;
    const invite = partyDb.invites.find((i) => i.id === params.inviteId && i.tripId === params.id);
    if (!invite) return apiError(404, 'Invite not found');
    if (invite.state === 'accepted')
      return apiError(409, 'This invite was already accepted: remove the member instead');
    invite.state = 'revoked';
    return new HttpResponse(null, { status: 204 });
  }),

  http.get<{ id: string }>('*/api/trips/:id/share', ({ params }) => {
    const access = guard(params.id, { leaderOnly: true });
    if ('response' in access) return access.response;
    return HttpResponse.json({ share: partyDb.shareLinks.get(params.id) });
  }),

  http.post<{ id: string }>('*/api/trips/:id/share', async ({ params, request }) => {
    const access = guard(params.id, { leaderOnly: true });
    if ('response' in access) return access.response;
    const parsed = shareCreateSchema.safeParse(await request.json().catch(() => ({})));
    if (!parsed.success) return validationError(parsed.error.issues);
    const days = parsed.data.expiresInDays ?? 30;
    const path = `/share/link-${partyId()}`;
    const share = {
      state: 'active' as const,
      url: `${publicUrl}${path}`,
      path,
      createdAt: fixedNow,
      expiresAt: new Date(Date.parse(fixedNow) + days * 86_400_000).toISOString(),
    };
    partyDb.shareLinks.set(params.id, share);
    return HttpResponse.json({ share }, { status: 201 });
  }),

  http.delete<{ id: string }>('*/api/trips/:id/share', ({ params }) => {
    const access = guard(params.id, { leaderOnly: true });
    if ('response' in access) return access.response;
    const share = partyDb.shareLinks.get(params.id);
    if (share && share.state === 'active')
      partyDb.shareLinks.set(params.id, { ...share, state: 'revoked', url: null, path: null });
    return new HttpResponse(null, { status: 204 });
  }),

  http.post<{ id: string }>('*/api/trips/:id/send-home', async ({ params, request }) => {
    const access = guard(params.id, { leaderOnly: true });
    if ('response' in access) return access.response;
    const parsed = sendHomeSchema.safeParse(await request.json().catch(() => ({})));
    if (!parsed.success) return validationError(parsed.error.issues);
    const viewers = access.members.filter((m) => m.role === 'viewer');
    if (viewers.length === 0)
      return apiError(422, 'No viewers on this trip: invite a contact at home as a viewer first');
    const share = partyDb.shareLinks.get(params.id);
    for (const viewer of viewers) deliver('trip-plan', viewer.email, 'The plan', parsed.data.note ?? '');
    return HttpResponse.json({
      sent: viewers.map((v) => ({ displayName: v.displayName, email: v.email, status: 'sent' })),
      share,
    });
  }),

  http.get<{ token: string }>('*/api/invites/:token', ({ params }) => {
    const invite = partyDb.invites.find((i) => i.token === params.token);
    if (!invite) return apiError(404, 'Invite not found');
    if (invite.state === 'accepted') return apiError(410, 'This invite was already used');
    if (invite.state === 'revoked') return apiError(410, 'This invite was withdrawn by the trip leader');
    if (invite.state === 'expired') return apiError(410, 'This invite has expired: ask the trip leader for a new one');
    return HttpResponse.json({
      invite: {
        tripName: partyDb.tripNames.get(invite.tripId) ?? 'A trip',
        role: invite.role,
        inviterName: invite.invitedByName ?? 'A trip leader',
      },
    });
  }),

  http.post<{ token: string }>('*/api/invites/:token/accept', ({ params }) => {
    const me = sessionAccount();
    if (!me) return apiError(401, 'Sign in to continue');
    const invite = partyDb.invites.find((i) => i.token === params.token);
    if (!invite) return apiError(404, 'Invite not found');
    if (invite.state !== 'pending') return apiError(410, 'This invite was already used');
    if (invite.email !== me.email)
      return apiError(403, 'This invite was sent to another e-mail address: sign in with the address it came to');
    invite.state = 'accepted';
    invite.acceptedAt = fixedNow;
    partyDb.members.get(invite.tripId)?.push({
      accountId: me.id,
      displayName: me.displayName,
      email: me.email,
      role: invite.role,
      gramLimitG: null,
      joinedAt: fixedNow,
    });
    return HttpResponse.json({ tripId: invite.tripId, role: invite.role });
  }),

  http.get<{ token: string }>('*/api/share/:token', ({ params }) => {
    const found = partyDb.sharedTrips.get(params.token);
    if (!found) return apiError(404, 'Share link not found');
    if ('status' in found) return apiError(found.status, found.message);
    return HttpResponse.json({ trip: found });
  }),
];
