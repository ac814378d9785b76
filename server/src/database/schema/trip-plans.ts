import type { PlanningInput, PlanResult } from '@gramwatt/shared';
import { planStatuses } from '@gramwatt/shared';
import { sql } from 'drizzle-orm';
import { check, index, integer, jsonb, pgEnum, pgTable, text, timestamp, uuid } from 'drizzle-orm/pg-core';
import { accounts } from './accounts';
import { trips } from './trips';

/** A plan's outcome as a PostgreSQL enum, from the one list in shared. */
export const planStatusEnum = pgEnum('plan_status', planStatuses);

/**
 * A stored plan of a trip: the exact planning input it was solved from (trip, devices, gear: so an old plan
 * still reads the same after the locker changes), the solver's answer, the model version and the time the
 * solve took. The status, headline and kit grams are copied out of `result` for the plan list.
 */
export const tripPlans = pgTable(
  'trip_plans',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    tripId: uuid('trip_id')
      .notNull()
      .references(() => trips.id, { onDelete: 'cascade' }),
    /** Who ran the plan; null once their account is gone. */
    createdBy: uuid('created_by').references(() => accounts.id, { onDelete: 'set null' }),
    input: jsonb('input').$type<PlanningInput>().notNull(),
    result: jsonb('result').$type<PlanResult>().notNull(),
    modelVersion: text('model_version').notNull(),
    /** Wall time from queueing the solve to its answer, ms. */
    durationMs: integer('duration_ms').notNull(),
    status: planStatusEnum('status').notNull(),
    headline: text('headline').notNull(),
    /** Grams of the plan's kit, or null when nothing is feasible. */
    massG: integer('mass_g'),
    createdAt: timestamp('created_at', { withTimezone: true, mode: 'date' }).notNull().defaultNow(),
  },
  (t) => [
    index('trip_plans_trip_created_idx').on(t.tripId, t.createdAt),
    check('trip_plans_duration_non_negative', sql`${t.durationMs} >= 0`),
  ],
);

export type TripPlanRow = typeof tripPlans.$inferSelect;
export type NewTripPlanRow = typeof tripPlans.$inferInsert;
