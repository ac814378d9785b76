/**
 * The seeded demo party's plan, built the way the server builds it (planning-input.builder.ts) from the demo data in
 * seed/src: Fern's whole locker plus the three items Tobin pools, every trip device with its override and Tobin's
 * phone, Fern's and Tobin's own gram limits. Timed: the optimum alone and the full plan (five swaps, four gram
 * prices), with the search's counters, so a change to the party solver or the kit search reads against the page a
 * visitor sees first.
 */
import { demoLockers } from '../../seed/src/demo-lockers.js';
import { demoParty } from '../../seed/src/demo-party.js';
import { demoTrips } from '../../seed/src/demo-trips.js';
import { planParty } from '../src/planning/plan-party.js';
import type { PartyPlanning, PlanningGear, PlanningInput } from '../src/planning/planning-input.js';
import { lockerItemInputSchema, lockerItemMassG, type LockerItemInput } from '../src/schemas/locker.js';
import { tripInputSchema } from '../src/schemas/trips.js';
import type { TripDevice } from '../src/schemas/kit.js';
import { buildTripSolarInput } from '../src/trips/trip-solar-input.js';
import { mergeUseProfile } from '../src/trips/use-profile-merge.js';
import { measure } from './measure.js';

const clock = (): number => performance.now();

/** A fixed first trip day, so the sun (and the figures) do not move with the day the bench runs. */
const demoStartDate = '2026-12-23';
/** The zone the server derives for the demo trip's start point (shared has no zone lookup). */
const demoTimeZone = 'Africa/Johannesburg';

type LockerRow = LockerItemInput & { itemId: string; massG: number };

function lockerOf(email: string): LockerRow[] {
  return (demoLockers[email] ?? []).map((raw, i) => {
    const item = lockerItemInputSchema.parse(raw);
    return { ...item, itemId: `${email.split('@')[0] ?? email}-${i}`, massG: lockerItemMassG(item.spec) };
  });
}

function tripDevice(item: LockerRow | undefined, override?: Parameters<typeof mergeUseProfile>[1]): TripDevice {
  if (!item || item.spec.kind !== 'device') throw new Error('a demo device is missing from its locker');
  const merged = mergeUseProfile(item.spec.useProfile, override, { deviceKind: item.spec.deviceKind });
  if (!merged.ok) throw new Error(`the demo override of ${item.name} does not fit`);
  return { deviceId: item.itemId, spec: { ...item.spec, useProfile: merged.useProfile } };
}

/** The demo party's planning input, as the server's builder makes it. */
export function demoPartyInput(): { input: PlanningInput; party: PartyPlanning } {
  const trip = demoTrips.find((t) => t.trip.name === demoParty.tripName);
  const partner = demoParty.members.find((m) => m.role === 'partner');
  if (!trip || !partner) throw new Error('the demo party has no trip or no partner');
  const tripInput = tripInputSchema.parse({ ...trip.trip, startDate: demoStartDate });
  const { solarInput } = buildTripSolarInput(tripInput, demoTimeZone);
  const leaderLocker = lockerOf(demoParty.leaderEmail);
  const partnerLocker = lockerOf(partner.email);
  const devices = [
    ...trip.devices.map((d) =>
      tripDevice(
        leaderLocker.find((i) => i.name === d.itemName),
        d.useProfileOverride,
      ),
    ),
    ...partner.devices.map((name) => tripDevice(partnerLocker.find((i) => i.name === name))),
  ];
  const asGear = (row: LockerRow, countOwned: number): PlanningGear[] =>
    row.spec.kind === 'device'
      ? []
      : [{ itemId: row.itemId, name: row.name, countOwned, massG: row.massG, spec: row.spec }];
  const gear = leaderLocker.flatMap((row) => asGear(row, row.countOwned));
  const ownerByItemId: Record<string, string> = Object.fromEntries(gear.map((g) => [g.itemId, 'leader']));
  for (const entry of partner.pool) {
    const row = partnerLocker.find((i) => i.name === entry.itemName);
    if (!row) throw new Error(`${entry.itemName} is not in the partner's demo locker`);
    gear.push(...asGear(row, Math.min(entry.count, row.countOwned)));
    ownerByItemId[row.itemId] = 'partner';
  }
  gear.sort((a, b) => (a.name < b.name ? -1 : a.name > b.name ? 1 : 0));
  const party: PartyPlanning = {
    members: [
      { memberId: 'leader', name: 'Leader', gramLimitG: demoParty.leaderGramLimitG },
      { memberId: 'partner', name: 'Partner', gramLimitG: partner.gramLimitG },
    ],
    ownerByItemId,
  };
  const input: PlanningInput = {
    solarInput,
    devices,
    deviceNames: Object.fromEntries(devices.map((d) => [d.deviceId, d.deviceId])),
    gear,
    reserveShare: tripInput.reserveShare,
    gramLimitG: tripInput.gramLimitG,
    party,
  };
  return { input, party };
}

export function benchDemoParty(): void {
  const { input, party } = demoPartyInput();
  // In its own process (bench/index.ts) the first plans run while the JIT compiles: warm up as a server thread is.
  const runs = { warmupRuns: 8, runs: 10, budgetMs: 60_000 };
  let last = '';
  measure(
    `planParty optimum, demo party (${input.gear.length} items, ${input.solarInput.nights} nights)`,
    () => {
      const plan = planParty(input, party, { withExtras: false, now: clock });
      last = `${plan.status}, ${plan.kit?.massG ?? '-'} g, ${plan.stats.rounds} rounds, ${plan.stats.judgedKits} kits judged`;
    },
    runs,
  );
  console.log(`  → ${last}`);
  measure(
    'planParty full plan (5 swaps, 4 gram prices), demo party',
    () => {
      const plan = planParty(input, party, { now: clock });
      last = `${plan.swaps.length} swaps, gram prices ${plan.gramPrices.map((p) => `${p.requirement} ${p.extraG ?? p.kind}`).join(', ')}`;
    },
    { warmupRuns: 1, runs: 3, budgetMs: 60_000 },
  );
  console.log(`  → ${last}`);
}
