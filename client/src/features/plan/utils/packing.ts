import type { Trip } from '@gramwatt/shared';
import type { ChargeSessionJson, KitEvaluation, PlanKit, PlanKitLine } from '../api/types';
import { localEnd, minutesOfDay, type LocalClock } from './local-time';

/** A store or device id in the schedule may carry its unit (`bank-id#2`); the item id is before the `#`. */
const itemIdOf = (id: string): string => id.split('#')[0] ?? id;
const unitOf = (id: string): number => Number(id.split('#')[1] ?? '1') || 1;

const ordinal = (unit: number): string => `${unit}${unit === 1 ? 'st' : unit === 2 ? 'nd' : unit === 3 ? 'rd' : 'th'}`;

/**
 * A name with its units when the kit carries more than one: "Cairn bank (2nd)", "Cairn bank (1st and 2nd)", or
 * "Cairn bank (both)" / "(all 3)" when a session draws on every unit (the units of one item are drawn together).
 */
const unitsName = (name: string, ids: readonly string[], countByItem: ReadonlyMap<string, number>): string => {
  const count = countByItem.get(itemIdOf(ids[0] ?? '')) ?? 1;
  if (count < 2) return name;
  const units = [...new Set(ids.map(unitOf))].sort((a, b) => a - b);
  if (units.length === count) return `${name} (${count === 2 ? 'both' : `all ${count}`})`;
  const listed = units.map(ordinal);
  return `${name} (${listed.length > 1 ? `${listed.slice(0, -1).join(', ')} and ${listed.at(-1)}` : listed[0]})`;
};

/** One hop energy takes, from a panel or store to a store or device, with what joins the two. */
export interface PackingHop {
  from: string;
  to: string;
  /** The converter between them, by name, or null. */
  via: string | null;
  /** The leads it needs, by name (empty when captive cables join the ports). */
  leads: string[];
  kind: ChargeSessionJson['kind'];
}

/** Hops in the order energy flows: sun into stores, top-ups from them, then radios run live from a pack. */
const hopOrder: Record<ChargeSessionJson['kind'], number> = { harvest: 0, 'top-up': 1, live: 2 };

/** How each kind of session starts its line in the schedule. */
export const scheduleKindLabels: Record<ChargeSessionJson['kind'], string> = {
  harvest: 'Sun: ',
  'top-up': 'Top-up: ',
  live: 'Runs live: ',
};

const nameIn = (lines: readonly PlanKitLine[]) => {
  const names = new Map(lines.map((line) => [line.itemId, line.name]));
  return (itemId: string) => names.get(itemId) ?? 'an item not in this kit';
};

/**
 * Every distinct hop of the charging schedule with the converter and leads it needs, panels' hops first — the
 * "every lead each hop needs" part of the packing list.
 */
export const hopsOf = (evaluation: Pick<KitEvaluation, 'schedule'>, lines: readonly PlanKitLine[]): PackingHop[] => {
  const name = nameIn(lines);
  const counts = new Map(lines.map((line) => [line.itemId, line.count]));
  const hops = new Map<
    string,
    { session: ChargeSessionJson; kind: PackingHop['kind']; fromIds: Set<string>; toIds: Set<string> }
  >();
  for (const s of evaluation.schedule) {
    // A radio topped up from a pack and run live from it takes the same hop: one line, the earlier in the flow. The
    // units of one item take the same hop too (one lead, moved from unit to unit): one line naming the units.
    const key = [itemIdOf(s.fromId), itemIdOf(s.toId), s.converterItemId ?? '', ...s.leadItemIds].join('|');
    const hop = hops.get(key) ?? { session: s, kind: s.kind, fromIds: new Set<string>(), toIds: new Set<string>() };
    if (hopOrder[s.kind] < hopOrder[hop.kind]) hop.kind = s.kind;
    hop.fromIds.add(s.fromId);
    hop.toIds.add(s.toId);
    hops.set(key, hop);
  }
  return [...hops.values()]
    .map(({ session: s, kind, fromIds, toIds }) => ({
      from: unitsName(s.fromName, [...fromIds], counts),
      to: unitsName(s.toName, [...toIds], counts),
      via: s.converterItemId ? name(s.converterItemId) : null,
      leads: s.leadItemIds.map(name),
      kind,
    }))
    .sort((a, b) => hopOrder[a.kind] - hopOrder[b.kind]);
};

/** Leads in the kit that no hop of the schedule uses (spares, or a path the expected sky never needed). */
export const sparesAmongLeads = (
  evaluation: Pick<KitEvaluation, 'schedule'>,
  lines: readonly PlanKitLine[],
): PlanKitLine[] => {
  const used = new Set(evaluation.schedule.flatMap((s) => s.leadItemIds));
  return lines.filter((line) => line.kind === 'lead' && !used.has(line.itemId));
};

/** One row of the charging schedule, in the trip's local time. */
export interface ScheduleRow {
  dayIndex: number;
  kind: ChargeSessionJson['kind'];
  start: string;
  /** Whether it starts after midnight, in the small hours of the trip day's night (a trip day runs morning to morning). */
  startsNextMorning: boolean;
  end: LocalClock;
  from: string;
  to: string;
  via: string | null;
  energyWh: number;
}

/** The charging schedule by day and start, local time, with names for every store and device. */
export const scheduleRows = (
  evaluation: Pick<KitEvaluation, 'schedule' | 'sunPaths'>,
  lines: readonly PlanKitLine[],
): ScheduleRow[] => {
  const name = nameIn(lines);
  // A trip day starts at the walking window's start; the first sun path's first point is that moment.
  const firstPoint = evaluation.sunPaths[0]?.points[0]?.localTime;
  const dayStartMin = firstPoint ? minutesOfDay(firstPoint) : 0;
  const counts = new Map(lines.map((line) => [line.itemId, line.count]));
  // Sessions that differ only in which unit of one item they draw on or fill, over the same hours, are one row.
  const merged = new Map<
    string,
    { session: ChargeSessionJson; fromIds: string[]; toIds: string[]; energyWh: number }
  >();
  for (const s of evaluation.schedule) {
    const key = [s.dayIndex, s.kind, s.start, s.end, itemIdOf(s.fromId), itemIdOf(s.toId), s.converterItemId].join('|');
    const row = merged.get(key);
    if (row) {
      row.fromIds.push(s.fromId);
      row.toIds.push(s.toId);
      row.energyWh += s.energyWh;
    } else merged.set(key, { session: s, fromIds: [s.fromId], toIds: [s.toId], energyWh: s.energyWh });
  }
  return [...merged.values()]
    .sort(
      (a, b) => a.session.dayIndex - b.session.dayIndex || Date.parse(a.session.start) - Date.parse(b.session.start),
    )
    .map(({ session: s, fromIds, toIds, energyWh }) => ({
      dayIndex: s.dayIndex,
      kind: s.kind,
      start: s.startLocalTime,
      startsNextMorning: minutesOfDay(s.startLocalTime) < dayStartMin,
      end: localEnd(s.startLocalTime, s.start, s.end),
      from: unitsName(s.fromName, fromIds, counts),
      to: unitsName(s.toName, toIds, counts),
      via: s.converterItemId ? name(s.converterItemId) : null,
      energyWh,
    }));
};

type Member = Trip['members'][number];
type Device = Trip['devices'][number];

/** One person's part of the packing list: the power gear they carry (grams against their own limit) and their devices. */
export interface CarrierPack {
  accountId: string | null;
  name: string;
  role: Member['role'] | null;
  lines: PlanKitLine[];
  kit: Pick<PlanKit, 'massG' | 'gramLimitG' | 'overLimitG'> | null;
  devices: Device[];
}

/**
 * The chosen kit by carrier: a party plan's carriers with their lines and own limits, or else the whole kit with the
 * leader; every device with the member who carries it. Carriers with nothing to pack are left out; the leader first.
 */
export const packsByCarrier = (kit: PlanKit, members: readonly Member[], devices: readonly Device[]): CarrierPack[] => {
  const leader = members.find((m) => m.role === 'leader');
  const memberOf = (accountId: string) => members.find((m) => m.accountId === accountId);
  const packs: CarrierPack[] = kit.carriers?.length
    ? kit.carriers.map((c) => ({
        accountId: c.memberId,
        name: c.name,
        role: memberOf(c.memberId)?.role ?? null,
        lines: c.lines,
        kit: { massG: c.massG, gramLimitG: c.gramLimitG, overLimitG: c.overG > 0 ? c.overG : null },
        devices: [],
      }))
    : [
        {
          accountId: leader?.accountId ?? null,
          name: leader?.displayName ?? 'The leader',
          role: 'leader',
          lines: kit.lines,
          kit,
          devices: [],
        },
      ];
  for (const device of devices) {
    let pack = packs.find((p) => p.accountId === device.carrierAccountId);
    if (!pack) {
      const member = memberOf(device.carrierAccountId);
      pack = {
        accountId: device.carrierAccountId,
        name: member?.displayName ?? 'Another member',
        role: member?.role ?? null,
        lines: [],
        kit: null,
        devices: [],
      };
      packs.push(pack);
    }
    pack.devices.push(device);
  }
  const rank = (p: CarrierPack) => (p.role === 'leader' ? 0 : 1);
  return packs.filter((p) => p.lines.length > 0 || p.devices.length > 0).sort((a, b) => rank(a) - rank(b));
};
