import type { Invite, InviteRole, MailDeliveryStatus, ShareLink, TripRole } from '@gramwatt/shared';

export const roleLabel: Record<TripRole, string> = { leader: 'Leader', partner: 'Partner', viewer: 'Viewer' };

/** What each role may do, in a line (shown beside the invite form and on the invite page). */
export const roleMeaning: Record<TripRole, string> = {
  leader: 'Edits the trip, invites and removes people, picks the kit and sends the plan home.',
  partner: 'Adds their own devices, shares gear from their locker with the party and runs the plan.',
  viewer: 'Reads the trip and its plan without changing anything — a contact at home, say.',
};

/** The same, said to the person who holds the role. */
export const roleForYou: Record<TripRole, string> = {
  leader: 'You lead this trip: you edit it, bring people in, set their gram limits and send the plan home.',
  partner:
    'You are a partner here: you add your own devices, share gear from your locker with the party and run the plan.',
  viewer: 'You are a viewer here: you can read the trip and its plan, but not change them.',
};

export const inviteRoleOptions: readonly { value: InviteRole; label: string }[] = [
  { value: 'partner', label: roleLabel.partner },
  { value: 'viewer', label: roleLabel.viewer },
];

const dateTimeFormat = new Intl.DateTimeFormat('en-GB', {
  day: 'numeric',
  month: 'short',
  year: 'numeric',
  hour: '2-digit',
  minute: '2-digit',
});

/** "14 Aug 2027, 09:30" in the reader's own clock (these are moments, not trip-local times). */
export const formatDateTime = (iso: string): string => dateTimeFormat.format(new Date(iso));

/** "No own limit" or "1,200 g". */
export const formatGramLimit = (gramLimitG: number | null): string =>
  gramLimitG === null ? 'No own limit' : `${gramLimitG.toLocaleString('en-GB')} g`;

const inviteStateWords: Record<Invite['state'], string> = {
  pending: 'Waiting for an answer',
  accepted: 'Joined',
  revoked: 'Withdrawn',
  expired: 'Expired',
};

/** The invite's state in words, with the moment that matters for it. */
export function describeInvite(invite: Pick<Invite, 'state' | 'expiresAt' | 'acceptedAt'>): string {
  if (invite.state === 'pending')
    return `${inviteStateWords.pending} · link works until ${formatDateTime(invite.expiresAt)}`;
  if (invite.state === 'accepted' && invite.acceptedAt)
    return `${inviteStateWords.accepted} ${formatDateTime(invite.acceptedAt)}`;
  return inviteStateWords[invite.state];
}

const mailStatusWords: Record<MailDeliveryStatus, string> = {
  queued: 'E-mail waiting to go out',
  sent: 'E-mail sent',
  failed: 'E-mail could not be sent',
};

/** How the invite's e-mail fared, e.g. "E-mail waiting to go out (2 tries so far)". */
export function describeMail(mail: Invite['mail']): string {
  if (!mail) return 'No e-mail recorded';
  const tries =
    mail.status === 'sent' || mail.attempts === 0
      ? ''
      : ` (${mail.attempts} ${mail.attempts === 1 ? 'try' : 'tries'} so far)`;
  const reason = mail.status === 'failed' && mail.lastError ? `: ${mail.lastError}` : '';
  return `${mailStatusWords[mail.status]}${tries}${reason}`;
}

/** The share link's state in a sentence. */
export function describeShareLink(share: ShareLink): string {
  switch (share.state) {
    case 'active':
      return share.expiresAt ? `Works until ${formatDateTime(share.expiresAt)}.` : 'Works now.';
    case 'revoked':
      return 'The last link was revoked: it no longer opens the trip.';
    case 'expired':
      return share.expiresAt
        ? `The last link ran out on ${formatDateTime(share.expiresAt)}.`
        : 'The last link ran out.';
    case 'none':
      return 'There is no link yet.';
  }
}
