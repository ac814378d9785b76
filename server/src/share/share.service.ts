import {
  GoneException,
  Inject,
  Injectable,
  NotFoundException,
  type OnModuleInit,
  UnprocessableEntityException,
} from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { ModuleRef } from '@nestjs/core';
import { type ShareLink, type SharedTrip, tripEndDate } from '@gramwatt/shared';
import { and, asc, eq } from 'drizzle-orm';
import { CLOCK, type Clock } from '../common/clock';
import type { AuthConfig } from '../config';
import { DRIZZLE, type Database } from '../database/database.types';
import {
  type AccountRow,
  type TripShareLinkRow,
  accounts,
  tripMembers,
  tripShareLinks,
  trips,
} from '../database/schema';
import { MailService } from '../mail/mail.service';
import { TripDevicesService } from '../trips/trip-devices.service';
import { planMail } from './plan-mail';
import { type ShareConfig, shareConfigKey } from './share.config';
import { ShareTokens, deriveShareSecret } from './share-token';
import { TRIP_PLAN_SUMMARY, type TripPlanSummarySource } from './trip-plan-summary';

export const shareNotFoundMessage = 'Share link not found';
export const shareExpiredMessage = 'This share link has expired: ask the trip leader for a new one';
export const shareRevokedMessage = 'This share link was revoked by the trip leader';

const roleRank = { leader: 0, partner: 1, viewer: 2 } as const;

/**
 * The read-only share link and the plan sent home. A link is a signed token (trip, version, expiry);
 * it works while the trip's share row has that version, is not revoked and not expired — so revoking,
 * or making a new link, stops every earlier one.
 */
@Injectable()
export class ShareService implements OnModuleInit {
  private plans: TripPlanSummarySource | null = null;
  private tokens!: ShareTokens;

  constructor(
    @Inject(DRIZZLE) private readonly db: Database,
    @Inject(CLOCK) private readonly clock: Clock,
    private readonly config: ConfigService,
    private readonly devices: TripDevicesService,
    private readonly mail: MailService,
    private readonly moduleRef: ModuleRef,
  ) {}

  onModuleInit(): void {
    const share = this.config.getOrThrow<ShareConfig>(shareConfigKey);
    const auth = this.config.getOrThrow<AuthConfig>('auth');
    this.tokens = new ShareTokens(share.secret ?? deriveShareSecret(auth.jwtSecret));
    try {
      // Whichever module provides the chosen kit's summary (the plans feature) registers it under this token.
      this.plans = this.moduleRef.get<TripPlanSummarySource>(TRIP_PLAN_SUMMARY, { strict: false });
    } catch {
      this.plans = null;
    }
  }

  /** A new link (every older one stops working), valid for `expiresInDays` or the configured lifetime. */
  async create(tripId: string, account: AccountRow, expiresInDays?: number): Promise<ShareLink> {
    const now = this.clock.now();
    const lifetimeS =
      expiresInDays === undefined
        ? this.config.getOrThrow<ShareConfig>(shareConfigKey).lifetimeS
        : expiresInDays * 86_400;
    // Whole seconds, so the token's `iat`/`exp` and the row agree exactly.
    const createdAt = new Date(Math.floor(now.getTime() / 1000) * 1000);
    const expiresAt = new Date(createdAt.getTime() + lifetimeS * 1000);
    const [existing] = await this.db.select().from(tripShareLinks).where(eq(tripShareLinks.tripId, tripId));
    const [row] = existing
      ? await this.db
          .update(tripShareLinks)
          .set({ version: existing.version + 1, createdBy: account.id, createdAt, expiresAt, revokedAt: null })
          .where(eq(tripShareLinks.tripId, tripId))
          .returning()
      : await this.db
          .insert(tripShareLinks)
          .values({ tripId, version: 1, createdBy: account.id, createdAt, expiresAt })
          .returning();
    if (!row) throw new Error('share link write returned no row');
    return this.view(row);
  }

  /** The trip's link as it stands (state `none` when there never was one). */
  async current(tripId: string): Promise<ShareLink> {
    const [row] = await this.db.select().from(tripShareLinks).where(eq(tripShareLinks.tripId, tripId));
    return this.view(row);
  }

  /** Stops the current link; revoking twice, or with no link, is fine. */
  async revoke(tripId: string): Promise<void> {
    await this.db.update(tripShareLinks).set({ revokedAt: this.clock.now() }).where(eq(tripShareLinks.tripId, tripId));
  }

  /**
   * The trip behind a link, read-only.
   * @throws 404 for a token that is not ours (bad signature, malformed, trip gone); 410 expired or revoked.
   */
  async read(token: string): Promise<SharedTrip> {
    const now = this.clock.now();
    const claims = this.tokens.verify(token, Math.floor(now.getTime() / 1000));
    if (claims === 'invalid') throw new NotFoundException(shareNotFoundMessage);
    if (claims === 'expired') throw new GoneException(shareExpiredMessage);
    const [row] = await this.db.select().from(tripShareLinks).where(eq(tripShareLinks.tripId, claims.tripId));
    if (!row) throw new NotFoundException(shareNotFoundMessage);
    if (row.version !== claims.version || row.revokedAt) throw new GoneException(shareRevokedMessage);
    if (row.expiresAt.getTime() <= now.getTime()) throw new GoneException(shareExpiredMessage);
    return this.summary(claims.tripId, row.expiresAt);
  }

  /**
   * E-mails every viewer the trip summary with the share link (made now if there is no active one).
   * @throws UnprocessableEntityException (422) when the trip has no viewers.
   */
  async sendHome(tripId: string, leader: AccountRow, note?: string) {
    const viewers = await this.db
      .select({ displayName: accounts.displayName, email: accounts.email })
      .from(tripMembers)
      .innerJoin(accounts, eq(accounts.id, tripMembers.accountId))
      .where(and(eq(tripMembers.tripId, tripId), eq(tripMembers.role, 'viewer')))
      .orderBy(asc(tripMembers.joinedAt));
    if (viewers.length === 0) {
      throw new UnprocessableEntityException('No viewers on this trip: invite a contact at home as a viewer first');
    }
    let share = await this.current(tripId);
    if (share.state !== 'active') share = await this.create(tripId, leader);
    const [row] = await this.db.select().from(tripShareLinks).where(eq(tripShareLinks.tripId, tripId));
    if (!row || !share.url) throw new Error('share link missing after create');
    const trip = await this.summary(tripId, row.expiresAt);
    const content = planMail({ trip, leaderName: leader.displayName, link: share.url, note });
    const sent = [];
    for (const viewer of viewers) {
      const message = await this.mail.send({ kind: 'trip-plan', to: viewer.email, tripId, ...content });
      sent.push({ displayName: viewer.displayName, email: viewer.email, status: message.status });
    }
    return { sent, share };
  }

  /** Trip basics, party (names and roles only), devices and the plan summary when there is one. */
  private async summary(tripId: string, linkExpiresAt: Date): Promise<SharedTrip> {
    const [trip] = await this.db.select().from(trips).where(eq(trips.id, tripId));
    if (!trip) throw new NotFoundException(shareNotFoundMessage);
    const members = await this.db
      .select({
        accountId: tripMembers.accountId,
        displayName: accounts.displayName,
        role: tripMembers.role,
        joinedAt: tripMembers.joinedAt,
      })
      .from(tripMembers)
      .innerJoin(accounts, eq(accounts.id, tripMembers.accountId))
      .where(eq(tripMembers.tripId, tripId))
      .orderBy(asc(tripMembers.joinedAt));
    members.sort((a, b) => roleRank[a.role] - roleRank[b.role]);
    const names = new Map(members.map((m) => [m.accountId, m.displayName]));
    const devices = await this.devices.list(tripId);
    return {
      name: trip.name,
      startDate: trip.startDate,
      endDate: tripEndDate(trip),
      nights: trip.nights,
      latitudeDeg: trip.latitudeDeg,
      longitudeDeg: trip.longitudeDeg,
      timeZone: trip.timeZone,
      gramLimitG: trip.gramLimitG,
      members: members.map((m) => ({ displayName: m.displayName, role: m.role })),
      devices: devices.map((d) => ({
        name: d.name,
        deviceKind: d.spec.deviceKind,
        carrierName: names.get(d.carrierAccountId) ?? 'its owner',
      })),
      plan: this.plans ? await this.plans.summaryFor(tripId) : null,
      linkExpiresAt: linkExpiresAt.toISOString(),
    };
  }

  private view(row: TripShareLinkRow | undefined): ShareLink {
    if (!row) return { state: 'none', url: null, path: null, createdAt: null, expiresAt: null };
    const base = { createdAt: row.createdAt.toISOString(), expiresAt: row.expiresAt.toISOString() };
    if (row.revokedAt) return { state: 'revoked', url: null, path: null, ...base };
    if (row.expiresAt.getTime() <= this.clock.now().getTime())
      return { state: 'expired', url: null, path: null, ...base };
    const token = this.tokens.sign({
      tripId: row.tripId,
      version: row.version,
      iat: Math.floor(row.createdAt.getTime() / 1000),
      exp: Math.floor(row.expiresAt.getTime() / 1000),
    });
    const path = `/share/${token}`;
    return { state: 'active', url: `${this.mail.publicUrl}${path}`, path, ...base };
  }
}
