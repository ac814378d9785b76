import type { KitEvaluation, KitSelection, PlanKit } from '@gramwatt/shared';
import { kitSources } from '@gramwatt/shared';
import { jsonb, pgEnum, pgTable, text, timestamp, uuid } from 'drizzle-orm/pg-core';
import { accounts } from './accounts';
import { tripPlans } from './trip-plans';
import { trips } from './trips';

/** Where a chosen kit came from, as a PostgreSQL enum, from the one list in shared. */
export const kitSourceEnum = pgEnum('kit_source', kitSources);

/**
 * A trip's chosen kit (one per trip): the lines the leader picked (a plan's optimum, one of its swaps, or a
 * kit picked by hand), the kit with names and grams, and its simulation when it was chosen — what the packing
 * list, the share page and the e-mails show. With no row, the latest plan's optimum stands.
 */
export const tripKits = pgTable('trip_kits', {
  tripId: uuid('trip_id')
    .primaryKey()
    .references(() => trips.id, { onDelete: 'cascade' }),
  source: kitSourceEnum('source').notNull(),
  /** The plan the kit came from; null for a hand-picked kit or once that plan is gone. */
  planId: uuid('plan_id').references(() => tripPlans.id, { onDelete: 'set null' }),
  lines: jsonb('lines').$type<KitSelection>().notNull(),
  kit: jsonb('kit').$type<PlanKit>().notNull(),
  evaluation: jsonb('evaluation').$type<KitEvaluation>().notNull(),
  /** The planner version that simulated `evaluation`; null for kits chosen before versions were kept. */
  modelVersion: text('model_version'),
  chosenBy: uuid('chosen_by').references(() => accounts.id, { onDelete: 'set null' }),
  chosenAt: timestamp('chosen_at', { withTimezone: true, mode: 'date' }).notNull().defaultNow(),
});

export type TripKitRow = typeof tripKits.$inferSelect;
export type NewTripKitRow = typeof tripKits.$inferInsert;
