import type { Invite, InviteCreate, InviteState } from '@gramwatt/shared';
import {
  ConflictException,
  ForbiddenException,
  GoneException,
  Inject,
  Injectable,
  NotFoundException,
} from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { and, desc, eq, isNull } from 'drizzle-orm';
import { CLOCK, type Clock } from '../common/clock';
import { DRIZZLE, type Database } from '../database/database.types';
import {
  type AccountRow,
  type MailMessageRow,
  type TripInviteRow,
  type TripMemberRow,
  accounts,
  mailMessages,
  tripInvites,
  tripMembers,
  trips,
} from '../database/schema';
import { MailService } from '../mail/mail.service';
import { type InvitesConfig, invitesConfigKey } from './invites.config';
import { inviteMail } from './invite-mail';
import { hashInviteToken, inviteTokenPattern, newInviteToken } from './invite-token';

export const inviteNotFoundMessage = 'Invite not found';
export const inviteUsedMessage = 'This invite was already used';
export const inviteRevokedMessage = 'This invite was withdrawn by the trip leader';
export const inviteExpiredMessage = 'This invite has expired: ask the trip leader for a new one';

function stateOf(row: TripInviteRow, now: Date): InviteState {
  if (row.acceptedAt) return 'accepted';
  if (row.revokedAt) return 'revoked';
  if (row.expiresAt.getTime() <= now.getTime()) return 'expired';
  return 'pending';
}

function toInviteView(
  row: TripInviteRow,
  now: Date,
  inviterName: string | null,
  mail: Pick<MailMessageRow, 'status' | 'attempts' | 'lastError'> | null,
): Invite {
  return {
    id: row.id,
    email: row.email,
    role: row.role === 'viewer' ? 'viewer' : 'partner',
    state: stateOf(row, now),
    invitedByName: inviterName,
    createdAt: row.createdAt.toISOString(),
    expiresAt: row.expiresAt.toISOString(),
    acceptedAt: row.acceptedAt?.toISOString() ?? null,
    mail: mail && { status: mail.status, attempts: mail.attempts, lastError: mail.lastError },
  };
}

/**
 * Invites by e-mail. The leader invites an address with a role; the e-mail carries a random single-use
 * token (only its hash is stored) that expires; the person with that address signs in and accepts.
 */
@Injectable()
export class InvitesService {
  constructor(
    @Inject(DRIZZLE) private readonly db: Database,
    @Inject(CLOCK) private readonly clock: Clock,
    private readonly mail: MailService,
    private readonly config: ConfigService,
  ) {}

  /**
   * A new invite, e-mailed at once. A pending invite to the same address is withdrawn (its link stops
   * working), so inviting again is how a leader resends.
   * @throws ConflictException (409) when the address already belongs to someone on the trip.
   */
  async create(leader: TripMemberRow, leaderAccount: AccountRow, input: InviteCreate): Promise<Invite> {
    const now = this.clock.now();
    const [onTrip] = await this.db
      .select({ accountId: tripMembers.accountId })
      .from(tripMembers)
      .innerJoin(accounts, eq(accounts.id, tripMembers.accountId))
      .where(and(eq(tripMembers.tripId, leader.tripId), eq(accounts.email, input.email)));
    if (onTrip) throw new ConflictException(`${input.email} is already on this trip`);
    const [trip] = await this.db.select({ name: trips.name }).from(trips).where(eq(trips.id, leader.tripId));
    if (!trip) throw new NotFoundException('Trip not found');

    const { token, tokenHash } = newInviteToken();
    const lifetimeS = this.config.getOrThrow<InvitesConfig>(invitesConfigKey).lifetimeS;
    const expiresAt = new Date(now.getTime() + lifetimeS * 1000);
    const invite = await this.db.transaction(async (tx) => {
      await tx
        .update(tripInvites)
        .set({ revokedAt: now })
        .where(
          and(
            eq(tripInvites.tripId, leader.tripId),
            eq(tripInvites.email, input.email),
            isNull(tripInvites.acceptedAt),
            isNull(tripInvites.revokedAt),
          ),
        );
      const [row] = await tx
        .insert(tripInvites)
        .values({
          tripId: leader.tripId,
          email: input.email,
          role: input.role,
          tokenHash,
          invitedBy: leaderAccount.id,
          createdAt: now,
          expiresAt,
        })
        .returning();
      if (!row) throw new Error('insert returned no row');
      return row;
    });

    const content = inviteMail({
      tripName: trip.name,
      inviterName: leaderAccount.displayName,
      role: input.role,
      link: `${this.mail.publicUrl}/invites/${token}`,
      expiresAt,
    });
    const message = await this.mail.send({ kind: 'trip-invite', to: input.email, tripId: leader.tripId, ...content });
    const [withMail] = await this.db
      .update(tripInvites)
      .set({ mailMessageId: message.id })
      .where(eq(tripInvites.id, invite.id))
      .returning();
    return toInviteView(withMail ?? invite, now, leaderAccount.displayName, message);
  }

  /** The trip's invites, newest first, with each e-mail's delivery status. */
  async list(tripId: string): Promise<Invite[]> {
    const rows = await this.db
      .select({ invite: tripInvites, inviterName: accounts.displayName, mail: mailMessages })
      .from(tripInvites)
      .leftJoin(accounts, eq(accounts.id, tripInvites.invitedBy))
      .leftJoin(mailMessages, eq(mailMessages.id, tripInvites.mailMessageId))
      .where(eq(tripInvites.tripId, tripId))
      .orderBy(desc(tripInvites.createdAt), desc(tripInvites.id));
    const now = this.clock.now();
    return rows.map((row) => toInviteView(row.invite, now, row.inviterName, row.mail));
  }

  /** Withdraws a pending invite (its link stops working). Withdrawing twice is fine; a used invite cannot be. */
  async revoke(tripId: string, inviteId: string): Promise<void> {
    const [row] = await this.db
      .select()
      .from(tripInvites)
      .where(and(eq(tripInvites.id, inviteId), eq(tripInvites.tripId, tripId)));
    if (!row) throw new NotFoundException(inviteNotFoundMessage);
    if (row.acceptedAt) throw new ConflictException('This invite was already accepted: remove the member instead');
    if (!row.revokedAt)
      await this.db.update(tripInvites).set({ revokedAt: this.clock.now() }).where(eq(tripInvites.id, inviteId));
  }

  /** What the link shows to anyone holding it: trip name, role, inviter. */
  async preview(token: string): Promise<{ tripName: string; role: 'partner' | 'viewer'; inviterName: string }> {
    const { invite, tripName, inviterName } = await this.usable(token);
    return {
      tripName,
      role: invite.role === 'viewer' ? 'viewer' : 'partner',
      inviterName: inviterName ?? 'A trip leader',
    };
  }

  /**
   * Joins the trip with the invite's role and uses the invite up.
   * @throws 404 unknown token; 410 used, withdrawn or expired; 403 signed in with another address; 409 already on the trip.
   */
  async accept(token: string, account: AccountRow): Promise<{ tripId: string; role: TripMemberRow['role'] }> {
    const { invite } = await this.usable(token);
    if (account.email.toLowerCase() !== invite.email) {
      throw new ForbiddenException(
        'This invite was sent to another e-mail address: sign in with the address it came to',
      );
    }
    const [existing] = await this.db
      .select()
      .from(tripMembers)
      .where(and(eq(tripMembers.tripId, invite.tripId), eq(tripMembers.accountId, account.id)));
    if (existing) throw new ConflictException(`You are already on this trip as ${existing.role}`);
    const now = this.clock.now();
    return this.db.transaction(async (tx) => {
      // Claiming the row and joining happen together; a second accept finds the invite used.
      const [claimed] = await tx
        .update(tripInvites)
        .set({ acceptedAt: now, acceptedBy: account.id })
        .where(and(eq(tripInvites.id, invite.id), isNull(tripInvites.acceptedAt), isNull(tripInvites.revokedAt)))
        .returning();
      if (!claimed) throw new GoneException(inviteUsedMessage);
      await tx
        .insert(tripMembers)
        .values({ tripId: invite.tripId, accountId: account.id, role: invite.role, joinedAt: now });
      return { tripId: invite.tripId, role: invite.role };
    });
  }

  /** The invite behind a token when it can still be used; otherwise the error that says why not. */
  private async usable(token: string) {
    if (!inviteTokenPattern.test(token)) throw new NotFoundException(inviteNotFoundMessage);
    const [row] = await this.db
      .select({ invite: tripInvites, tripName: trips.name, inviterName: accounts.displayName })
      .from(tripInvites)
      .innerJoin(trips, eq(trips.id, tripInvites.tripId))
      .leftJoin(accounts, eq(accounts.id, tripInvites.invitedBy))
      .where(eq(tripInvites.tokenHash, hashInviteToken(token)));
    if (!row) throw new NotFoundException(inviteNotFoundMessage);
    const state = stateOf(row.invite, this.clock.now());
    if (state === 'accepted') throw new GoneException(inviteUsedMessage);
    if (state === 'revoked') throw new GoneException(inviteRevokedMessage);
    if (state === 'expired') throw new GoneException(inviteExpiredMessage);
    return row;
  }
}
