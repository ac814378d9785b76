import { threadId as mainThreadId } from 'node:worker_threads';
import {
  type ChosenKit,
  type CheckResult,
  type PlanRecord,
  type PlanSummary,
  checkResultSchema,
  chosenKitResponseSchema,
  planListResponseSchema,
  planModelVersion,
  planResponseSchema,
} from '@gramwatt/shared';
import { UnprocessableEntityException } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { eq } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { type LockerItemRow, tripKits, tripPlans } from '../src/database/schema';
import { defaultPlanWorkerFile, PlanSolver } from '../src/plans/plan-solver';
import { noDevicesMessage, PlanningInputBuilder } from '../src/plans/planning-input.builder';
import { plansConfigKey, readPlansConfig } from '../src/plans/plans.config';
import { heldPlanWorkerFile, highRoute, insertLockerItems, planDevices, planGear } from './support/plan-fixtures';
import { type TestApp, startTestApp } from './support/test-app';
import {
  type Hiker,
  createTrip,
  editLockerSpec,
  errorPaths,
  fixtureWrittenAt,
  insertLockerItem,
  signedInHiker,
  testPhoneSpec,
} from './support/trip-fixtures';

const byName = (gear: LockerItemRow[], name: string): LockerItemRow => {
  const row = gear.find((g) => g.name === name);
  if (!row) throw new Error(`no ${name} in the fixture`);
  return row;
};

describe('plans', () => {
  let t: TestApp;
  let leader: Hiker;
  let outsider: Hiker;
  let route: Awaited<ReturnType<typeof highRoute>>;
  let plan: PlanRecord;

  beforeAll(async () => {
    t = await startTestApp({ env: { PLAN_WORKER_THREADS: '1', PLAN_QUEUE_MAX: '1', PLAN_RETRY_AFTER_S: '7' } });
    leader = await signedInHiker(t);
    outsider = await signedInHiker(t);
    route = await highRoute(t, leader);
    const solved = await t.http().post(`/api/trips/${route.trip.id}/plans`).set(leader.auth).send({}).expect(201);
    plan = planResponseSchema.parse(solved.body).plan;
  });

  afterAll(async () => {
    await t.close();
  });

  it('solves the trip on the leader’s locker gear and stores the plan with its input and model version', async () => {
    expect(plan).toMatchObject({ tripId: route.trip.id, createdBy: leader.id, modelVersion: planModelVersion });
    expect(plan.durationMs).toBeGreaterThanOrEqual(0);
    const { result } = plan;
    expect(result.status).toBe('optimal');
    const kit = result.kit;
    if (!kit || !result.evaluation) throw new Error('an optimal plan has a kit and its simulation');
    // Every line is the leader's power gear, within the units owned; the grams add up; the kit fits the limit.
    const gearIds = new Map(route.gear.map((g) => [g.id, g]));
    for (const line of kit.lines) {
      expect(line.count).toBeLessThanOrEqual(gearIds.get(line.itemId)?.countOwned ?? 0);
      expect(line.massG).toBe(line.unitMassG * line.count);
    }
    expect(kit.massG).toBe(kit.lines.reduce((sum, l) => sum + l.massG, 0));
    expect(kit.gramLimitG).toBe(1400);
    expect(kit.massG).toBeLessThanOrEqual(1400);
    expect(result.evaluation.verdict.status).not.toBe('runs-dry');
    expect(result.evaluation.cautions.length).toBeGreaterThan(0);
    expect(result.swaps.length).toBeGreaterThan(0);
    expect(result.gramPrices.map((p) => p.requirement)).toContain('transmit-minutes');
    // The snapshot is what was solved: the trip's four devices and every piece of the leader's power gear.
    const [row] = await t.db.select().from(tripPlans).where(eq(tripPlans.id, plan.id));
    expect(row?.input.devices).toHaveLength(planDevices.length);
    expect(row?.input.gear.map((g) => g.itemId).sort()).toEqual(route.gear.map((g) => g.id).sort());
    expect(row?.input.deviceNames?.[route.devices[0]?.id ?? '']).toBe('Handheld radio, 5 W');
    expect(row).toMatchObject({ status: 'optimal', massG: kit.massG, headline: result.headline });
  });

  it('lists plans newest first without answers, and reads one; the default chosen kit is the latest plan’s optimum', async () => {
    const chosen = await t.http().get(`/api/trips/${route.trip.id}/kit`).set(leader.auth).expect(200);
    expect(chosenKitResponseSchema.parse(chosen.body).kit).toMatchObject({
      source: 'optimum',
      planId: plan.id,
      kit: plan.result.kit,
    });

    // A plan on part of the gear: no boost converter, so nothing can charge the 12 V radio.
    t.clock.advanceS(60);
    const noConverters = route.gear.filter((g) => g.kind !== 'converter').map((g) => g.id);
    const partial = await t
      .http()
      .post(`/api/trips/${route.trip.id}/plans`)
      .set(leader.auth)
      .send({ itemIds: noConverters })
      .expect(201);
    const second = planResponseSchema.parse(partial.body).plan;
    expect(second.result.status).toBe('nothing-feasible');
    expect(second.result.kit).toBeNull();
    expect(second.result.nothingFeasible?.missing.join(' ')).toContain('Handheld radio, 5 W');

    const listed = await t.http().get(`/api/trips/${route.trip.id}/plans`).set(leader.auth).expect(200);
    const plans: PlanSummary[] = planListResponseSchema.parse(listed.body).plans;
    expect(plans.map((p) => p.id)).toEqual([second.id, plan.id]);
    expect(plans[1]).toMatchObject({
      status: 'optimal',
      massG: plan.result.kit?.massG,
      headline: plan.result.headline,
    });
    expect(listed.body.plans[0]).not.toHaveProperty('result');

    const one = await t.http().get(`/api/trips/${route.trip.id}/plans/${plan.id}`).set(leader.auth).expect(200);
    expect(one.body.plan).toEqual(plan);
    // The latest plan found nothing that works: no kit stands in for a choice.
    const none = await t.http().get(`/api/trips/${route.trip.id}/kit`).set(leader.auth).expect(200);
    expect(none.body).toEqual({ kit: null });
  });

  it('answers 400 with the field path for items that are not the leader’s power gear', async () => {
    const [stranger] = await insertLockerItems(t.db, outsider.id, planGear.slice(0, 1));
    const bad = await t
      .http()
      .post(`/api/trips/${route.trip.id}/plans`)
      .set(leader.auth)
      .send({ itemIds: [route.gear[0]?.id, stranger?.id, route.devices[0]?.id] })
      .expect(400);
    expect(errorPaths(bad)).toEqual(['itemIds.1', 'itemIds.2']);
  });

  it('hides plans and kits of a trip the caller is not on (404), and another trip’s plan from this trip', async () => {
    const base = `/api/trips/${route.trip.id}`;
    await t.http().get(`${base}/plans`).set(outsider.auth).expect(404);
    await t.http().get(`${base}/plans/${plan.id}`).set(outsider.auth).expect(404);
    await t.http().post(`${base}/plans`).set(outsider.auth).send({}).expect(404);
    await t.http().post(`${base}/check`).set(outsider.auth).send({ kit: [] }).expect(404);
    await t.http().get(`${base}/kit`).set(outsider.auth).expect(404);
    await t.http().put(`${base}/kit`).set(outsider.auth).send({ kit: [], source: 'hand' }).expect(404);

    // The outsider's own trip cannot reach the leader's plan by id, and their attempts change nothing.
    const own = await createTrip(t, outsider);
    await t.http().get(`/api/trips/${own.id}/plans/${plan.id}`).set(outsider.auth).expect(404);
    await t.http().get(`/api/trips/${own.id}/plans/not-a-uuid`).set(outsider.auth).expect(404);
    const rows = await t.db.select().from(tripPlans).where(eq(tripPlans.id, plan.id));
    expect(rows[0]?.tripId).toBe(route.trip.id);
    expect(await t.db.select().from(tripKits).where(eq(tripKits.tripId, route.trip.id))).toEqual([]);
  });

  it('checks a hand-picked kit: verdict, ledger and the changes that shave grams', async () => {
    const kit = plan.result.kit;
    if (!kit) throw new Error('the plan has a kit');
    // The optimum plus a panel it left out: still works, and leaving that panel home is a shave.
    const spare = route.gear.find((g) => g.kind === 'panel' && !kit.lines.some((l) => l.itemId === g.id));
    if (!spare) throw new Error('the fixture owns a panel the optimum leaves out');
    const selection = [...kit.lines.map((l) => ({ itemId: l.itemId, count: l.count })), { itemId: spare.id, count: 1 }];
    const checked = await t
      .http()
      .post(`/api/trips/${route.trip.id}/check`)
      .set(leader.auth)
      .send({ kit: selection })
      .expect(200);
    const result: CheckResult = checkResultSchema.parse(checked.body);
    expect(result.kit.massG).toBe(kit.massG + spare.massG);
    expect(result.evaluation.verdict.status).not.toBe('runs-dry');
    expect(result.evaluation.ledgers[0]?.days).toHaveLength(6);
    expect(result.shaves).toContainEqual(
      expect.objectContaining({ change: { kind: 'remove', itemId: spare.id }, savedG: spare.massG, massG: kit.massG }),
    );
    for (const shave of result.shaves) expect(shave.massG).toBe(result.kit.massG - shave.savedG);

    // One bank alone: the radio has no path, so the kit runs dry, and the sentence names the device.
    const bank = byName(route.gear, 'Knoll 10 000 mAh bank');
    const thin = await t
      .http()
      .post(`/api/trips/${route.trip.id}/check`)
      .set(leader.auth)
      .send({ kit: [{ itemId: bank.id, count: 1 }] })
      .expect(200);
    expect(thin.body.evaluation.verdict.status).toBe('runs-dry');
    expect(thin.body.evaluation.verdict.text).not.toContain(route.devices[0]?.id);
  });

  it('refuses a hand-picked kit with unknown, someone else’s or device items, or more than owned (400 with paths)', async () => {
    const [theirs] = await insertLockerItems(t.db, outsider.id, planGear.slice(3, 4));
    const lead = byName(route.gear, 'USB-A to USB-C lead, 30 cm');
    const bad = await t
      .http()
      .post(`/api/trips/${route.trip.id}/check`)
      .set(leader.auth)
      .send({
        kit: [
          { itemId: '00000000-0000-4000-8000-000000000000', count: 1 },
          { itemId: theirs?.id, count: 1 },
          { itemId: route.devices[1]?.id, count: 1 },
          { itemId: lead.id, count: 3 },
        ],
      })
      .expect(400);
    expect(errorPaths(bad)).toEqual(['kit.0.itemId', 'kit.1.itemId', 'kit.2.itemId', 'kit.3.count']);
    const body = await t
      .http()
      .post(`/api/trips/${route.trip.id}/check`)
      .set(leader.auth)
      .send({ kit: [{ itemId: lead.id, count: 0 }] })
      .expect(400);
    expect(errorPaths(body)).toEqual(['kit.0.count']);
  });

  it('stores the chosen kit (a swap), which the share page then carries; a plan id of another trip is refused', async () => {
    const swap = plan.result.swaps[0];
    if (!swap) throw new Error('the plan has swaps');
    const lines = swap.kit.lines.map((l) => ({ itemId: l.itemId, count: l.count }));
    // The outsider's own trip and plan (their locker has no power gear: it finds nothing, quickly).
    const own = await createTrip(t, outsider);
    const phone = await insertLockerItem(t.db, outsider.id, testPhoneSpec());
    await t.http().post(`/api/trips/${own.id}/devices`).set(outsider.auth).send({ itemId: phone.id }).expect(201);
    const otherPlan = await t.http().post(`/api/trips/${own.id}/plans`).set(outsider.auth).send({}).expect(201);
    const refused = await t
      .http()
      .put(`/api/trips/${route.trip.id}/kit`)
      .set(leader.auth)
      .send({ kit: lines, source: 'swap', planId: otherPlan.body.plan.id })
      .expect(400);
    expect(errorPaths(refused)).toEqual(['planId']);

    t.clock.advanceS(60);
    const stored = await t
      .http()
      .put(`/api/trips/${route.trip.id}/kit`)
      .set(leader.auth)
      .send({ kit: lines, source: 'swap', planId: plan.id })
      .expect(200);
    const chosen: ChosenKit | null = chosenKitResponseSchema.parse(stored.body).kit;
    expect(chosen).toMatchObject({
      source: 'swap',
      planId: plan.id,
      updatedAt: t.clock.now().toISOString(),
      modelVersion: planModelVersion,
    });
    expect(chosen?.kit.massG).toBe(swap.kit.massG);
    expect(chosen?.kit.lines.map((l) => l.itemId).sort()).toEqual(lines.map((l) => l.itemId).sort());
    expect(chosen?.evaluation.verdict.status).not.toBe('runs-dry');
    const read = await t.http().get(`/api/trips/${route.trip.id}/kit`).set(leader.auth).expect(200);
    expect(read.body).toEqual(stored.body);

    const share = await t.http().post(`/api/trips/${route.trip.id}/share`).set(leader.auth).send({}).expect(201);
    const shared = await t.http().get(`/api${share.body.share.path}`).expect(200);
    expect(shared.body.trip.plan).toEqual({
      verdict: chosen?.evaluation.verdict.text,
      kitMassG: swap.kit.massG,
      carriers: [
        {
          name: 'Test Hiker',
          massG: swap.kit.massG,
          items: swap.kit.lines.map((l) => ({ name: l.name, count: l.count })),
        },
      ],
      cautions: chosen?.evaluation.cautions.map((c) => c.text),
      earlierPlanner: false,
      tripChanged: false,
    });
    // A kit an earlier planner simulated says so on the share page (its verdict may no longer be the planner's).
    await t.db.update(tripKits).set({ modelVersion: 'gramwatt-plan-1' }).where(eq(tripKits.tripId, route.trip.id));
    const older = await t.http().get(`/api${share.body.share.path}`).expect(200);
    expect(older.body.trip.plan.earlierPlanner).toBe(true);
    expect(older.body.trip.plan.tripChanged).toBe(false);
    // A device changed after the choice: the share page says its verdict is for the trip as it was.
    t.clock.advanceS(60);
    const tripRead = await t.http().get(`/api/trips/${route.trip.id}`).set(leader.auth).expect(200);
    const deviceId = (tripRead.body.trip ?? tripRead.body).devices[0].id as string;
    await t
      .http()
      .patch(`/api/trips/${route.trip.id}/devices/${deviceId}`)
      .set(leader.auth)
      .send({ useProfileOverride: null })
      .expect(200);
    const changed = await t.http().get(`/api${share.body.share.path}`).expect(200);
    expect(changed.body.trip.plan.tripChanged).toBe(true);
    // Chosen again (as of now), then the device edited in the locker: stale again; then taken off the trip: stale.
    const staleAfter = async (change: () => Promise<unknown>) => {
      await t.db.update(tripKits).set({ chosenAt: t.clock.now() }).where(eq(tripKits.tripId, route.trip.id));
      const fresh = await t.http().get(`/api${share.body.share.path}`).expect(200);
      expect(fresh.body.trip.plan.tripChanged).toBe(false);
      t.clock.advanceS(60);
      await change();
      return (await t.http().get(`/api${share.body.share.path}`).expect(200)).body.trip.plan.tripChanged;
    };
    const device = (tripRead.body.trip ?? tripRead.body).devices[0];
    const editInLocker = () =>
      editLockerSpec(t, leader, device.itemId, (spec) => ({ ...spec, ownBatteryWh: (spec.ownBatteryWh ?? 0) + 1 }));
    expect(await staleAfter(editInLocker)).toBe(true);
    const takeOff = () =>
      t.http().delete(`/api/trips/${route.trip.id}/devices/${deviceId}`).set(leader.auth).expect(204);
    expect(await staleAfter(takeOff)).toBe(true);
    // The kit's own gear edited in the locker (a bank or panel that is not a device): stale, and `GET kit` says when.
    const gearId = swap.kit.lines[0]?.itemId as string;
    const editGear = () => editLockerSpec(t, leader, gearId, (spec) => ({ ...spec, massG: (spec.massG ?? 0) + 1 }));
    expect(await staleAfter(editGear)).toBe(true);
    const afterGear = await t.http().get(`/api/trips/${route.trip.id}/kit`).set(leader.auth).expect(200);
    expect(afterGear.body.kit.gearChangedAt).toBe(t.clock.now().toISOString());
    const kitRead = await t.http().get(`/api/trips/${route.trip.id}/kit`).set(leader.auth).expect(200);
    expect(kitRead.body.kit.modelVersion).toBe('gramwatt-plan-1');
  });

  /** Deleting `outsideId` from the locker leaves the trip's change time alone; deleting `insideId` (kit gear) moves it. */
  const expectOnlyKitGearDeletionMarksTrip = async (
    hiker: Hiker,
    tripId: string,
    outsideId: string,
    insideId: string,
  ): Promise<void> => {
    const tripTime = async () =>
      (await t.http().get(`/api/trips/${tripId}`).set(hiker.auth).expect(200)).body.trip.updatedAt;
    const before = await tripTime();
    t.clock.advanceS(60);
    await t.http().delete(`/api/locker/items/${outsideId}`).set(hiker.auth).expect(204);
    expect(await tripTime()).toBe(before);
    t.clock.advanceS(60);
    await t.http().delete(`/api/locker/items/${insideId}`).set(hiker.auth).expect(204);
    expect(await tripTime()).toBe(t.clock.now().toISOString());
  };

  it("a plan's gear edited in the locker shows on the plan; deleting gear in a chosen kit marks the trip as changed, other gear's deletion does not", async () => {
    const other = await signedInHiker(t);
    const own = await highRoute(t, other);
    const [inKit, notInKit] = own.gear;
    if (!inKit || !notInKit) throw new Error('the high route has gear');
    await t
      .http()
      .put(`/api/trips/${own.trip.id}/kit`)
      .set(other.auth)
      .send({ kit: [{ itemId: inKit.id, count: 1 }], source: 'hand' })
      .expect(200);
    // A plan says when the gear it weighed last had its locker spec changed (the plan tab's caution reads it).
    const solved = await t.http().post(`/api/trips/${own.trip.id}/plans`).set(other.auth).send({}).expect(201);
    expect(solved.body.plan.gearChangedAt).toBe(fixtureWrittenAt.toISOString());
    t.clock.advanceS(60);
    await editLockerSpec(t, other, notInKit.id, (spec) => ({ ...spec, massG: (spec.massG ?? 0) + 1 }));
    const planUrl = `/api/trips/${own.trip.id}/plans/${solved.body.plan.id}`;
    const read = await t.http().get(planUrl).set(other.auth).expect(200);
    expect(read.body.plan.gearChangedAt).toBe(t.clock.now().toISOString());

    await expectOnlyKitGearDeletionMarksTrip(other, own.trip.id, notInKit.id, inKit.id);
  });

  it("with no kit chosen, deleting gear in the latest plan's optimum (the kit that stands) marks the trip as changed", async () => {
    const other = await signedInHiker(t);
    const own = await highRoute(t, other);
    const solved = await t.http().post(`/api/trips/${own.trip.id}/plans`).set(other.auth).send({}).expect(201);
    const inOptimum = new Set<string>(solved.body.plan.result.kit.lines.map((l: { itemId: string }) => l.itemId));
    const outside = own.gear.find((g) => !inOptimum.has(g.id));
    const inside = own.gear.find((g) => inOptimum.has(g.id));
    if (!outside || !inside) throw new Error('the high route has gear in and outside its optimum');
    const standing = await t.http().get(`/api/trips/${own.trip.id}/kit`).set(other.auth).expect(200);
    expect(standing.body.kit.source).toBe('optimum');

    await expectOnlyKitGearDeletionMarksTrip(other, own.trip.id, outside.id, inside.id);
  });

  it('a plan counts the gear that joined the trip after it, which it never weighed; a new device does not count', async () => {
    const other = await signedInHiker(t);
    const own = await highRoute(t, other);
    const solved = await t.http().post(`/api/trips/${own.trip.id}/plans`).set(other.auth).send({}).expect(201);
    const addedCount = async () =>
      (await t.http().get(`/api/trips/${own.trip.id}/plans/${solved.body.plan.id}`).set(other.auth).expect(200)).body
        .plan.gearAddedCount;
    expect(solved.body.plan.gearAddedCount).toBe(0);
    t.clock.advanceS(60);
    await t.http().post('/api/locker/items').set(other.auth).send(planGear[0]).expect(201);
    expect(await addedCount()).toBe(1);
    await t.http().post('/api/locker/items').set(other.auth).send(planDevices[0]?.item).expect(201);
    expect(await addedCount()).toBe(1);
    // One more unit of an item the plan weighed: the plan never weighed that unit.
    const weighed = own.gear[0];
    if (!weighed) throw new Error('the high route has gear');
    const current = (await t.http().get(`/api/locker/items/${weighed.id}`).set(other.auth).expect(200)).body.item;
    await t
      .http()
      .put(`/api/locker/items/${weighed.id}`)
      .set(other.auth)
      .send({ name: current.name, notes: current.notes, countOwned: current.countOwned + 1, spec: current.spec })
      .expect(200);
    expect(await addedCount()).toBe(2);
    // The list stays light: no per-plan counts.
    const list = await t.http().get(`/api/trips/${own.trip.id}/plans`).set(other.auth).expect(200);
    expect(list.body.plans[0]).not.toHaveProperty('gearAddedCount');
  });

  it('answers 422 for a trip with no devices', async () => {
    const empty = await createTrip(t, leader);
    const res = await t.http().post(`/api/trips/${empty.id}/plans`).set(leader.auth).send({}).expect(422);
    expect(res.body).toEqual({ statusCode: 422, message: noDevicesMessage, errors: [] });
    await t.http().post(`/api/trips/${empty.id}/check`).set(leader.auth).send({ kit: [] }).expect(422);
  });

  /** A solver of its own over the `plans` namespace read from `env` (the app's stays as it is). */
  const solverWith = (env: Record<string, string>, workerFile: string) =>
    new PlanSolver(new ConfigService({ [plansConfigKey]: readPlansConfig(env) }), workerFile);

  it('answers 422 when no kit could be verified within the time limit, and frees the thread', async () => {
    const { input } = await t.app.get(PlanningInputBuilder).forTrip(route.trip.id);
    const solver = solverWith(
      { PLAN_WORKER_THREADS: '1', PLAN_TIME_LIMIT_MS: '100', PLAN_STOP_GRACE_MS: '100' },
      heldPlanWorkerFile,
    );
    try {
      const error = await solver.plan(input).catch((e: unknown) => e);
      expect(error).toBeInstanceOf(UnprocessableEntityException);
      expect((error as Error).message).toMatch(/^No kit could be verified within 0\.2 s/);
      const checked = await solver.check(input, []).catch((e: unknown) => e);
      expect((checked as Error).message).toMatch(/^This kit could not be simulated/);
      expect(solver.load).toBe(0);
    } finally {
      await solver.onModuleDestroy();
    }
  });

  it('with a tiny time limit answers the best kit verified so far, with a note (not a 422)', async () => {
    const { input } = await t.app.get(PlanningInputBuilder).forTrip(route.trip.id);
    const solver = solverWith({ PLAN_TIME_LIMIT_MS: '1' }, defaultPlanWorkerFile);
    try {
      const { value: result } = await solver.plan(input);
      expect(result.kit).not.toBeNull();
      expect(result.evaluation?.verdict.status).not.toBe('runs-dry');
      if (result.status === 'best-so-far') expect(result.notes.length).toBeGreaterThan(0);
      else expect(result.status).toBe('optimal');
    } finally {
      await solver.onModuleDestroy();
    }
  });

  it('checks a kit with a tiny time limit: the verdict, and the shaves left untried counted (not a 422)', async () => {
    const { input } = await t.app.get(PlanningInputBuilder).forTrip(route.trip.id);
    const whole = input.gear.map((g) => ({ itemId: g.itemId, count: g.countOwned }));
    const solver = solverWith({ PLAN_TIME_LIMIT_MS: '1' }, defaultPlanWorkerFile);
    const roomy = solverWith({}, defaultPlanWorkerFile);
    try {
      const { value: rushed } = await solver.check(input, whole);
      const { value: full } = await roomy.check(input, whole);
      expect(rushed.evaluation.verdict).toEqual(full.evaluation.verdict);
      expect(full.untriedChanges).toBe(0);
      expect(full.shaves.length).toBeGreaterThan(0);
      // The simulation of the whole locker alone outlasts 1 ms, so no change was tried in time.
      expect(rushed.shaves).toEqual([]);
      expect(rushed.untriedChanges).toBeGreaterThanOrEqual(full.shaves.length);
    } finally {
      await solver.onModuleDestroy();
      await roomy.onModuleDestroy();
    }
  });

  it('keeps a solver thread warm across a pause shorter than PLAN_THREAD_IDLE_MS, and ends it after a longer one', async () => {
    const { input } = await t.app
      .get(PlanningInputBuilder)
      .forTrip(route.trip.id, { itemIds: [route.gear[0]?.id ?? ''] });
    // Well past the short idle time, so a thread end that the timer delays still lands before the next plan.
    const pauseMs = 2_500;
    const shortIdle = solverWith({ PLAN_WORKER_THREADS: '1', PLAN_THREAD_IDLE_MS: '1000' }, defaultPlanWorkerFile);
    const longIdle = solverWith({ PLAN_WORKER_THREADS: '1' }, defaultPlanWorkerFile);
    const pause = () => new Promise((done) => setTimeout(done, pauseMs));
    try {
      const [shortFirst, longFirst] = await Promise.all([shortIdle.plan(input, false), longIdle.plan(input, false)]);
      await pause();
      const [shortAfter, longAfter] = await Promise.all([shortIdle.plan(input, false), longIdle.plan(input, false)]);
      // The default keeps the thread (and what it compiled); an idle time shorter than the pause started a new one.
      expect(longAfter.threadId).toBe(longFirst.threadId);
      expect(shortAfter.threadId).not.toBe(shortFirst.threadId);
    } finally {
      await shortIdle.onModuleDestroy();
      await longIdle.onModuleDestroy();
    }
  });

  it('warms a solver thread as the server starts and when the plans are listed with none warm; the plan runs on it', async () => {
    const warmApp = await startTestApp({
      env: { PLAN_WORKER_THREADS: '1', PLAN_THREAD_IDLE_MS: '1000', PLAN_WARM_UP: 'true' },
    });
    try {
      const solver = warmApp.app.get(PlanSolver);
      // Started by the bootstrap: the call waits for it.
      expect(solver.warmingUp).toBe(true);
      const first = await solver.warmUp();
      expect(first).toEqual(expect.any(Number));
      // A thread used this instant is warm: no second warm-up.
      expect(await solver.warmUp()).toBeUndefined();
      const hiker = await signedInHiker(warmApp);
      const warmRoute = await highRoute(warmApp, hiker);
      // Well past the 1 s idle time: the warmed thread has ended, so listing the plans warms a new one.
      await new Promise((done) => setTimeout(done, 2_500));
      await warmApp.http().get(`/api/trips/${warmRoute.trip.id}/plans`).set(hiker.auth).expect(200);
      expect(solver.warmingUp).toBe(true);
      const second = await solver.warmUp();
      expect(second).toEqual(expect.any(Number));
      expect(second).not.toBe(first);
      const { input } = await warmApp.app.get(PlanningInputBuilder).forTrip(warmRoute.trip.id);
      const run = await solver.plan(input, false);
      expect(run.threadId).toBe(second);
      // With warm-up off (the tests' default), nothing is started.
      expect(t.app.get(PlanSolver).warmingUp).toBe(false);
      expect(await t.app.get(PlanSolver).warmUp()).toBeUndefined();
    } finally {
      await warmApp.close();
    }
  });

  it('refuses a solve with 503 and Retry-After when every thread and queue place is taken, and serves other requests meanwhile', async () => {
    // An app of its own with one thread and one queue place, whose worker holds each task 2 s before solving: two
    // whole plans fill them however fast the engine is (the real worker now solves this trip in well under a second).
    const busyApp = await startTestApp({
      env: { PLAN_WORKER_THREADS: '1', PLAN_QUEUE_MAX: '1', PLAN_RETRY_AFTER_S: '7' },
      planWorkerFile: heldPlanWorkerFile,
    });
    try {
      const hiker = await signedInHiker(busyApp);
      const busyRoute = await highRoute(busyApp, hiker);
      const { input } = await busyApp.app.get(PlanningInputBuilder).forTrip(busyRoute.trip.id);
      const solver = busyApp.app.get(PlanSolver);
      let solved = 0;
      const running = [solver.plan(input), solver.plan(input)].map((run) => run.then(() => (solved += 1)));
      const plansUrl = `/api/trips/${busyRoute.trip.id}/plans`;
      const busy = await busyApp.http().post(plansUrl).set(hiker.auth).send({}).expect(503);
      expect(busy.headers['retry-after']).toBe('7');
      expect(busy.body).toMatchObject({ statusCode: 503, errors: [] });
      expect(busy.body.message).toContain('busy');
      await busyApp.http().post(`/api/trips/${busyRoute.trip.id}/check`).set(hiker.auth).send({ kit: [] }).expect(503);
      // Health and reads answer while both solves are still running.
      const health = await busyApp.http().get('/api/health').expect(200);
      expect(health.body.status).toBe('ok');
      await busyApp.http().get(plansUrl).set(hiker.auth).expect(200);
      expect(solved).toBe(0);
      await Promise.all(running);
      expect(solved).toBe(2);
      expect(solver.load).toBe(0);
    } finally {
      await busyApp.close();
    }
  });

  it('solves in a worker thread, not on the server’s event loop', async () => {
    const { input } = await t.app
      .get(PlanningInputBuilder)
      .forTrip(route.trip.id, { itemIds: [route.gear[0]?.id ?? ''] });
    const solver = t.app.get(PlanSolver);
    const run = await solver.plan(input, false);
    expect(run.threadId).not.toBe(mainThreadId);
    expect(run.value.modelVersion).toBe(planModelVersion);
    expect(solver.load).toBe(0);
  });
});
