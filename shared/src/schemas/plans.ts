import { z } from 'zod';

/**
 * Plans: what the solver answers for a trip, what the check route answers for a hand-picked kit, and the trip's
 * chosen kit. Shared by the server (which stores and returns them) and the client (which draws them). Every field
 * is plain JSON; energies in Wh, masses in g, shares 0–1, times as ISO strings or `YYYY-MM-DD` local dates.
 */

/** One line of a kit selection: a locker item id and how many units. */
export const kitSelectionLineSchema = z.object({
  itemId: z.string({ error: 'Item id is required' }).min(1, { error: 'Item id is required' }).max(100),
  count: z
    .number({ error: 'Count must be a number' })
    .int({ error: 'Count is a whole number' })
    .min(1, { error: 'Count is at least 1' })
    .max(20, { error: 'Count may be at most 20' }),
});
/** A kit picked by hand or chosen from a plan: lines with unique item ids. */
export const kitSelectionSchema = z
  .array(kitSelectionLineSchema)
  .max(200, { error: 'A kit has at most 200 lines' })
  .superRefine((lines, ctx) => {
    const seen = new Set<string>();
    lines.forEach((line, i) => {
      if (seen.has(line.itemId))
        ctx.addIssue({ code: 'custom', path: [i, 'itemId'], message: 'This item is already in the kit' });
      seen.add(line.itemId);
    });
  });
export type KitSelection = z.infer<typeof kitSelectionSchema>;

/** Body of `POST /api/trips/:id/check`. */
export const checkRequestSchema = z.object({ kit: kitSelectionSchema });
export type CheckRequest = z.infer<typeof checkRequestSchema>;

/** Body of `POST /api/trips/:id/plans`: optionally only some of the leader's locker items. */
export const planRequestSchema = z.object({
  itemIds: z.array(z.string().min(1).max(100)).max(500, { error: 'At most 500 items' }).optional(),
});
export type PlanRequest = z.infer<typeof planRequestSchema>;

export const kitSources = ['optimum', 'swap', 'hand'] as const;
/** Body of `PUT /api/trips/:id/kit`. */
export const chooseKitRequestSchema = z.object({
  kit: kitSelectionSchema,
  source: z.enum(kitSources, { error: 'Source must be optimum, swap or hand' }),
  planId: z.uuid({ error: 'Plan id must be a UUID' }).optional(),
});
export type ChooseKitRequest = z.infer<typeof chooseKitRequestSchema>;

/** One line of a kit as shown: name, kind, count and grams. */
export const planKitLineSchema = z.object({
  itemId: z.string(),
  name: z.string(),
  kind: z.string(),
  count: z.number().int(),
  unitMassG: z.number(),
  massG: z.number(),
});
export type PlanKitLine = z.infer<typeof planKitLineSchema>;

/**
 * One carrier's share of a party's kit: the lines they carry, their grams against their own limit (null: none) and
 * the grams over it (0 when within it).
 */
export const planCarrierSchema = z.object({
  memberId: z.string(),
  name: z.string(),
  lines: z.array(planKitLineSchema),
  massG: z.number(),
  gramLimitG: z.number().nullable(),
  overG: z.number(),
});
export type PlanCarrier = z.infer<typeof planCarrierSchema>;

export const planKitSchema = z.object({
  lines: z.array(planKitLineSchema),
  massG: z.number(),
  gramLimitG: z.number().nullable(),
  /** Grams over the limit, or null when within it (or no limit). */
  overLimitG: z.number().nullable(),
  /** A party's plan: who carries what (every leader and partner, also those who carry nothing). Absent for one hiker. */
  carriers: z.array(planCarrierSchema).optional(),
});
export type PlanKit = z.infer<typeof planKitSchema>;

export const planVerdictSchema = z.object({
  status: z.enum(['keeps-up', 'lasts-trip', 'runs-dry']),
  /** The verdict as one plain sentence. */
  text: z.string(),
  /** 0-based day it runs dry (runs-dry), else null. */
  dayIndex: z.number().nullable(),
  deviceId: z.string().nullable(),
  worstMarginShare: z.number().nullable(),
  wouldRunDryOnDayIndex: z.number().nullable(),
});
export type PlanVerdict = z.infer<typeof planVerdictSchema>;

export const dayStripCellSchema = z.object({
  dayIndex: z.number().int(),
  date: z.string(),
  storedEndWh: z.number(),
  /** Stored energy at the day's end as a share of all storage (stores and devices), 0–1. */
  storedEndShare: z.number(),
  dry: z.boolean(),
});
export type DayStripCell = z.infer<typeof dayStripCellSchema>;

export const ledgerDaySchema = z.object({
  dayIndex: z.number().int(),
  availableHarvestWh: z.number(),
  harvestWh: z.number(),
  spilledWh: z.number(),
  frozenSpilledWh: z.number(),
  storeChargeLossWh: z.number(),
  storeOutputLossWh: z.number(),
  converterLossWh: z.number(),
  deviceChargeLossWh: z.number(),
  toppedUpWh: z.number(),
  deliveredWh: z.number(),
  unmetWh: z.number(),
  storedStartWh: z.number(),
  storedEndWh: z.number(),
  storesStartWh: z.number(),
  storesEndWh: z.number(),
  devicesStartWh: z.number(),
  devicesEndWh: z.number(),
  frozenHours: z.number(),
});

export const designSkyIdSchema = z.enum(['expected', 'cloudy-start', 'cloudy-middle', 'cloudy-end']);

export const chargeSessionJsonSchema = z.object({
  kind: z.enum(['harvest', 'top-up', 'live']),
  dayIndex: z.number().int(),
  fromId: z.string(),
  toId: z.string(),
  /** Names for the packing list ("Ridge panel 10 W", "Handheld radio"). */
  fromName: z.string(),
  toName: z.string(),
  converterItemId: z.string().nullable(),
  leadItemIds: z.array(z.string()),
  startLocalTime: z.string(),
  start: z.string(),
  end: z.string(),
  energyWh: z.number(),
});
export type ChargeSessionJson = z.infer<typeof chargeSessionJsonSchema>;

export const planCautionSchema = z.object({
  id: z.string(),
  severity: z.string(),
  text: z.string(),
});

/** The simulation of one kit on the trip, as the plan page and the check route show it. */
export const kitEvaluationSchema = z.object({
  verdict: planVerdictSchema,
  /** The design sky with the least margin (or the one that runs dry first). */
  bindingSkyId: designSkyIdSchema,
  dayStrip: z.array(dayStripCellSchema),
  ledgers: z.array(z.object({ skyId: designSkyIdSchema, days: z.array(ledgerDaySchema) })),
  storedSeries: z.array(
    z.object({ skyId: designSkyIdSchema, points: z.array(z.object({ t: z.string(), storedWh: z.number() })) }),
  ),
  /** Expected sky: what the panels put into stores each day against what the devices used. */
  dailyBalance: z.array(
    z.object({ dayIndex: z.number().int(), date: z.string(), harvestWh: z.number(), demandWh: z.number() }),
  ),
  sunPaths: z.array(
    z.object({
      dayIndex: z.number().int(),
      date: z.string(),
      points: z.array(
        z.object({ t: z.string(), localTime: z.string(), altitudeDeg: z.number(), azimuthDeg: z.number() }),
      ),
    }),
  ),
  schedule: z.array(chargeSessionJsonSchema),
  cautions: z.array(planCautionSchema),
  /** Kit items no path uses. */
  unusedItemIds: z.array(z.string()),
  massG: z.number(),
  /** Usable storage of the kit's stores, Wh. */
  storageWh: z.number(),
});
export type KitEvaluation = z.infer<typeof kitEvaluationSchema>;

export const planSwapSchema = z.object({
  kit: planKitSchema,
  extraG: z.number(),
  added: z.array(z.object({ itemId: z.string(), name: z.string(), count: z.number().int() })),
  removed: z.array(z.object({ itemId: z.string(), name: z.string(), count: z.number().int() })),
  buys: z.array(z.string()),
  worstMarginShare: z.number().nullable(),
  /** Plain words: "120 g more: adds a second Larch bank; 18 % more to spare". */
  text: z.string(),
});
export type PlanSwap = z.infer<typeof planSwapSchema>;

export const gramPriceRequirements = ['transmit-minutes', 'receive-hours', 'cloudy-run', 'reserve'] as const;
export const planGramPriceSchema = z.object({
  requirement: z.enum(gramPriceRequirements),
  /** "10 more transmit minutes a day". */
  change: z.string(),
  kind: z.enum(['grams', 'free', 'nothing-feasible', 'unknown']),
  extraG: z.number().nullable(),
  /** "free up to 30 more minutes", when the kit already has the headroom. */
  freeUpTo: z.string().nullable(),
  /** "10 more transmit minutes a day cost 85 g". */
  text: z.string(),
});
export type PlanGramPrice = z.infer<typeof planGramPriceSchema>;

export const planStatuses = ['optimal', 'over-limit', 'best-so-far', 'nothing-feasible'] as const;

/**
 * Which power path the kit gives the 12 V devices — a 12 V pack (with its controller and 12 V panel when it has them),
 * USB banks with a boost converter, or both — and what the other path would weigh for the same trip.
 */
export const planPathChoiceSchema = z.object({
  path: z.enum(['pack', 'banks', 'both']),
  /** Grams of the lightest kit that works without the chosen path; null when none does (or both are carried). */
  otherMassG: z.number().nullable(),
  /** otherMassG − the kit's grams; null as above. */
  savedG: z.number().nullable(),
  /** "The LiFePO₄ pack path is 140 g lighter than two banks and a boost converter for this trip." */
  text: z.string(),
});
export type PlanPathChoice = z.infer<typeof planPathChoiceSchema>;

export const planResultSchema = z.object({
  modelVersion: z.string(),
  status: z.enum(planStatuses),
  /** The answer as one plain sentence. */
  headline: z.string(),
  kit: planKitSchema.nullable(),
  evaluation: kitEvaluationSchema.nullable(),
  swaps: z.array(planSwapSchema),
  gramPrices: z.array(planGramPriceSchema),
  nothingFeasible: z
    .object({
      /** Plain sentences: "No converter in the locker can charge the Summit handheld (12 V)". */
      missing: z.array(z.string()),
      shortfalls: z.array(z.object({ skyId: z.string(), dayIndex: z.number().int(), shortWh: z.number() })),
      runsDry: z.object({ dayIndex: z.number().int(), deviceId: z.string(), skyId: z.string() }).nullable(),
      text: z.string(),
    })
    .nullable(),
  /** Only when the gear holds both paths for a 12 V device (older plans have none). */
  pathChoice: planPathChoiceSchema.nullable().default(null),
  notes: z.array(z.string()),
  stats: z.object({
    rounds: z.number(),
    judgedKits: z.number(),
    activeItems: z.number(),
    candidateItems: z.number(),
    optimumMs: z.number(),
    totalMs: z.number(),
  }),
});
export type PlanResult = z.infer<typeof planResultSchema>;

export const kitShaveSchema = z.object({
  change: z.discriminatedUnion('kind', [
    z.object({ kind: z.literal('remove'), itemId: z.string() }),
    z.object({ kind: z.literal('replace'), itemId: z.string(), withItemId: z.string() }),
  ]),
  /** "Leave the Tarn lead at home: saves 40 g and still keeps up". */
  text: z.string(),
  savedG: z.number(),
  massG: z.number(),
});
export type KitShaveJson = z.infer<typeof kitShaveSchema>;

export const checkResultSchema = z.object({
  kit: planKitSchema,
  evaluation: kitEvaluationSchema,
  shaves: z.array(kitShaveSchema),
  /** Changes left untried when the check ran out of time (the biggest savings are tried first); 0 when all were. */
  untriedChanges: z.number().int().min(0),
});
export type CheckResult = z.infer<typeof checkResultSchema>;

/** A stored plan. */
export const planRecordSchema = z.object({
  id: z.string(),
  tripId: z.string(),
  createdAt: z.string(),
  createdBy: z.string(),
  modelVersion: z.string(),
  durationMs: z.number(),
  result: planResultSchema,
  /**
   * When the locker spec of the gear the plan weighed last changed (the latest over its input's items; null when none
   * is in a locker any more): after `createdAt`, the plan's figures are for gear as it was.
   */
  gearChangedAt: z.string().nullable().default(null),
  /**
   * How many items of gear the plan never weighed: added to the leader's locker or shared into the pool after it, or
   * weighed with fewer units than are now owned or shared. A lighter kit may now exist.
   */
  gearAddedCount: z.number().int().nonnegative().default(0),
});
export type PlanRecord = z.infer<typeof planRecordSchema>;

/** A plan in a list (no heavy fields). */
export const planSummarySchema = planRecordSchema
  .omit({ result: true, gearChangedAt: true, gearAddedCount: true })
  .extend({
    status: z.enum(planStatuses),
    headline: z.string(),
    massG: z.number().nullable(),
  });
export type PlanSummary = z.infer<typeof planSummarySchema>;

/** The trip's chosen kit, which the packing list and e-mails use. */
export const chosenKitSchema = z.object({
  kit: planKitSchema,
  source: z.enum(kitSources),
  planId: z.string().nullable(),
  updatedAt: z.string(),
  evaluation: kitEvaluationSchema,
  /**
   * The planner version whose simulation `evaluation` is (`planModelVersion` when it was chosen; null for a kit chosen
   * before versions were kept): an earlier one may judge the kit differently.
   */
  modelVersion: z.string().nullable(),
  /**
   * When the locker spec of the kit's gear last changed (the latest over its items; null when none is in a locker any
   * more, or for a kit not read from the server): after `updatedAt`, the verdict is for gear as it was.
   */
  gearChangedAt: z.string().nullable().default(null),
});
export type ChosenKit = z.infer<typeof chosenKitSchema>;

export const planResponseSchema = z.object({ plan: planRecordSchema });
export const planListResponseSchema = z.object({ plans: z.array(planSummarySchema) });
export const chosenKitResponseSchema = z.object({ kit: chosenKitSchema.nullable() });
