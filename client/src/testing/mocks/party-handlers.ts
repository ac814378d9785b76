import {
  inviteCreateSchema,
  memberUpdateSchema,
  sendHomeSchema,
  shareCreateSchema,
  type OutboxMessage,
  type TripMember,
} from '@gramwatt/shared';
import { http, HttpResponse } from 'msw';
import { sessionAccount } from './db';
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

/** A fake of the party, share-link and outbox routes, following the server's contract. */
export const partyHandlers = [
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
