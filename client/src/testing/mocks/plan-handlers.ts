import {
  checkRequestSchema,
  chooseKitRequestSchema,
  planRequestSchema,
  type CheckResult,
  type ChooseKitRequest,
  type ChosenKit,
  type KitSelection,
  type LockerItem,
  type PlanRecord,
  type PlanResult,
  type PlanSummary,
  type PoolListResponse,
  type Trip,
} from '@gramwatt/shared';
import { http, HttpResponse } from 'msw';
import { bankSpec, buildLockerItem, leadSpec, panelSpec } from '../locker-data';
import {
  buildChosenKit,
  buildCheckResult,
  buildPlanRecord,
  buildPlanResult,
  buildPlanTrip,
  fixtureGear,
  kitLines,
  planLeaderId,
  type FixtureGearKey,
} from '../plan-data';
import { server } from './server';

const apiError = (statusCode: number, message: string, errors: Array<{ path: string; message: string }> = []) =>
  HttpResponse.json({ statusCode, message, errors }, { status: statusCode });

const validationError = (issues: Array<{ path: PropertyKey[]; message: string }>) =>
  apiError(
    400,
    'Some fields need attention',
    issues.map((issue) => ({ path: issue.path.map(String).join('.'), message: issue.message })),
  );

/** The fixture gear as locker items, so try-a-kit can pick them. */
export const fixtureLockerItems = (): LockerItem[] => {
  const specs: Record<FixtureGearKey, LockerItem['spec']> = {
    panel: panelSpec({ ratedW: 12, massG: fixtureGear.panel.unitMassG }),
    bigBank: bankSpec({ capacityMah: 20_000, massG: fixtureGear.bigBank.unitMassG }),
    smallBank: bankSpec({ capacityMah: 5000, massG: fixtureGear.smallBank.unitMassG }),
    boost: {
      kind: 'converter',
      converterType: 'boost',
      inputVolts: 5,
      outputVolts: 13.8,
      maxOutputA: 0.6,
      efficiency: 0.83,
      inputPort: { connector: 'usb-a', captiveCable: true },
      outputPort: { connector: 'barrel-5.5x2.1', captiveCable: true },
      massG: fixtureGear.boost.unitMassG,
    },
    dcLead: leadSpec({ fromConnector: 'barrel-5.5x2.1', toConnector: 'radio-dc', massG: fixtureGear.dcLead.unitMassG }),
    usbLead: leadSpec({ fromConnector: 'usb-c', toConnector: 'usb-c', massG: fixtureGear.usbLead.unitMassG }),
    spareLead: leadSpec({ fromConnector: 'usb-a', toConnector: 'micro-usb', massG: fixtureGear.spareLead.unitMassG }),
  };
  return (Object.keys(fixtureGear) as FixtureGearKey[]).map((key) => {
    const { ownerId: _ownerId, ...item } = buildLockerItem(planLeaderId, {
      id: fixtureGear[key].itemId,
      name: fixtureGear[key].name,
      spec: specs[key],
      countOwned: key === 'bigBank' ? 2 : 1,
    });
    return item;
  });
};

/** Kit lines of the fixture gear for a selection (unknown ids are left out). */
export const linesFor = (kit: KitSelection) => {
  const keyOf = new Map((Object.keys(fixtureGear) as FixtureGearKey[]).map((key) => [fixtureGear[key].itemId, key]));
  return kitLines(
    Object.fromEntries(kit.flatMap((line) => (keyOf.has(line.itemId) ? [[keyOf.get(line.itemId), line.count]] : []))),
  );
};

/** A fake of the plan routes of one trip; tests change what it answers and read what it was asked. */
export interface FakePlanApi {
  trip: Trip;
  /** Stored plans, newest first. */
  plans: PlanRecord[];
  chosen: ChosenKit | null;
  lockerItems: LockerItem[];
  /** The party's pool; by default the leader has pooled nothing, so the leader's whole locker counts. */
  pool: PoolListResponse;
  /** What the next solve answers: a result to store, or a response (503, 422, …). */
  solve: () => PlanResult | Response | Promise<PlanResult | Response>;
  /** What a check answers. */
  check: (kit: KitSelection) => CheckResult | Response;
  requests: { solves: number; checks: KitSelection[]; chosen: ChooseKitRequest[] };
}

const summaryOf = ({ result, ...plan }: PlanRecord): PlanSummary => ({
  ...plan,
  status: result.status,
  headline: result.headline,
  massG: result.kit?.massG ?? null,
});

/** Installs the fake for this test (MSW's handlers are reset after each test). */
export const installPlanApi = (overrides: Partial<Omit<FakePlanApi, 'requests'>> = {}): FakePlanApi => {
  const fake: FakePlanApi = {
    trip: buildPlanTrip(),
    plans: [],
    chosen: null,
    lockerItems: fixtureLockerItems(),
    pool: { items: [], leaderWholeLocker: true },
    solve: () => buildPlanResult(),
    check: (kit) => buildCheckResult(linesFor(kit)),
    ...overrides,
    requests: { solves: 0, checks: [], chosen: [] },
  };
  const tripOf = (id: string | readonly string[] | undefined) => (id === fake.trip.id ? fake.trip : null);
  server.use(
    http.get<{ tripId: string }>('*/api/trips/:tripId', ({ params }) =>
      tripOf(params.tripId) ? HttpResponse.json({ trip: fake.trip }) : apiError(404, 'No such trip'),
    ),
    http.get<{ tripId: string }>('*/api/trips/:tripId/plans', ({ params }) =>
      tripOf(params.tripId) ? HttpResponse.json({ plans: fake.plans.map(summaryOf) }) : apiError(404, 'No such trip'),
    ),
    http.get<{ tripId: string; planId: string }>('*/api/trips/:tripId/plans/:planId', ({ params }) => {
      const plan = tripOf(params.tripId) && fake.plans.find((p) => p.id === params.planId);
      return plan ? HttpResponse.json({ plan }) : apiError(404, 'No such plan');
    }),
    http.post<{ tripId: string }>('*/api/trips/:tripId/plans', async ({ params, request }) => {
      if (!tripOf(params.tripId)) return apiError(404, 'No such trip');
      if (fake.trip.myRole === 'viewer') return apiError(403, 'Viewers cannot solve this trip');
      const parsed = planRequestSchema.safeParse(await request.json());
      if (!parsed.success) return validationError(parsed.error.issues);
      fake.requests.solves += 1;
      const answer = await fake.solve();
      if (answer instanceof Response) return answer;
      // Solved after the fixture trip's last change, a minute after the plan before it.
      const createdAt = new Date(Date.UTC(2027, 1, 20, 10, 20 + fake.plans.length)).toISOString();
      const plan = buildPlanRecord(answer, { createdAt });
      fake.plans.unshift(plan);
      return HttpResponse.json({ plan }, { status: 201 });
    }),
    http.post<{ tripId: string }>('*/api/trips/:tripId/check', async ({ params, request }) => {
      if (!tripOf(params.tripId)) return apiError(404, 'No such trip');
      const parsed = checkRequestSchema.safeParse(await request.json());
      if (!parsed.success) return validationError(parsed.error.issues);
      fake.requests.checks.push(parsed.data.kit);
      const answer = fake.check(parsed.data.kit);
      return answer instanceof Response ? answer : HttpResponse.json(answer);
    }),
    http.get<{ tripId: string }>('*/api/trips/:tripId/kit', ({ params }) =>
      tripOf(params.tripId) ? HttpResponse.json({ kit: fake.chosen }) : apiError(404, 'No such trip'),
    ),
    http.put<{ tripId: string }>('*/api/trips/:tripId/kit', async ({ params, request }) => {
      if (!tripOf(params.tripId)) return apiError(404, 'No such trip');
      if (fake.trip.myRole !== 'leader') return apiError(403, 'Only the leader chooses the kit');
      const parsed = chooseKitRequestSchema.safeParse(await request.json());
      if (!parsed.success) return validationError(parsed.error.issues);
      fake.requests.chosen.push(parsed.data);
      fake.chosen = buildChosenKit(linesFor(parsed.data.kit), {
        source: parsed.data.source,
        planId: parsed.data.planId ?? null,
      });
      return HttpResponse.json({ kit: fake.chosen });
    }),
    http.get<{ tripId: string }>('*/api/trips/:tripId/pool', ({ params }) =>
      tripOf(params.tripId) ? HttpResponse.json(fake.pool) : apiError(404, 'No such trip'),
    ),
    http.get('*/api/locker/items', () => HttpResponse.json({ items: fake.lockerItems, totalMassG: 0 })),
  );
  return fake;
};
