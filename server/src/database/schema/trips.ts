import type { SkyPresetId, TripSolarInput } from '@gramwatt/shared';
import { sql } from 'drizzle-orm';
import { boolean, check, date, doublePrecision, index, integer, jsonb, pgTable, text, uuid } from 'drizzle-orm/pg-core';
import { timestamps } from './_helpers';

/**
 * A planned trip. `solar_input` holds the exact `TripSolarInput` the engine takes (validated by the service
 * on every write, time zone and sky resolved); the start date, nights, place and zone are copied out of it
 * so trips can be listed and ordered without reading the JSON. Who may see or change a trip is in
 * `trip_members`.
 */
export const trips = pgTable(
  'trips',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    name: text('name').notNull(),
    notes: text('notes').notNull().default(''),
    /** First trip day, local to the trip (`solar_input.startDate`). */
    startDate: date('start_date', { mode: 'string' }).notNull(),
    nights: integer('nights').notNull(),
    latitudeDeg: doublePrecision('latitude_deg').notNull(),
    longitudeDeg: doublePrecision('longitude_deg').notNull(),
    /** IANA zone (`solar_input.timeZone`). */
    timeZone: text('time_zone').notNull(),
    /** True when the server derived the zone from the start point. */
    timeZoneDerived: boolean('time_zone_derived').notNull().default(false),
    /** The sky preset the values came from, or null for custom values. */
    skyPresetId: text('sky_preset_id').$type<SkyPresetId>(),
    reserveShare: doublePrecision('reserve_share').notNull(),
    /** Grams of power gear for the whole trip, or null for no limit. */
    gramLimitG: integer('gram_limit_g'),
    solarInput: jsonb('solar_input').$type<TripSolarInput>().notNull(),
    ...timestamps,
  },
  (t) => [
    index('trips_start_date_idx').on(t.startDate),
    check('trips_nights_range', sql`${t.nights} between 1 and 60`),
    check('trips_reserve_share_range', sql`${t.reserveShare} >= 0 and ${t.reserveShare} < 1`),
    check('trips_gram_limit_positive', sql`${t.gramLimitG} is null or ${t.gramLimitG} > 0`),
  ],
);

export type TripRow = typeof trips.$inferSelect;
export type NewTripRow = typeof trips.$inferInsert;
