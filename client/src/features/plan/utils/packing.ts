import type { ChargeSessionJson, KitEvaluation, PlanKitLine } from '../api/types';
import { localEnd, type LocalClock } from './local-time';

/** A store or device id in the schedule may carry its unit (`bank-id#2`); the item id is before the `#`. */
const itemIdOf = (id: string): string => id.split('#')[0] ?? id;
const unitOf = (id: string): number => Number(id.split('#')[1] ?? '1') || 1;

/** A name with its unit when the kit carries more than one: "Cairn bank (2nd)". */
const unitName = (name: string, id: string, countByItem: ReadonlyMap<string, number>): string => {
  if ((countByItem.get(itemIdOf(id)) ?? 1) < 2) return name;
  const unit = unitOf(id);
  const suffix = unit === 1 ? 'st' : unit === 2 ? 'nd' : unit === 3 ? 'rd' : 'th';
  return `${name} (${unit}${suffix})`;
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
  const hops = new Map<string, PackingHop>();
  for (const s of evaluation.schedule) {
    const key = [s.kind, s.fromId, s.toId, s.converterItemId ?? '', ...s.leadItemIds].join('|');
    if (hops.has(key)) continue;
    hops.set(key, {
      from: unitName(s.fromName, s.fromId, counts),
      to: unitName(s.toName, s.toId, counts),
      via: s.converterItemId ? name(s.converterItemId) : null,
      leads: s.leadItemIds.map(name),
      kind: s.kind,
    });
  }
  return [...hops.values()].sort((a, b) => (a.kind === b.kind ? 0 : a.kind === 'harvest' ? -1 : 1));
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
  end: LocalClock;
  from: string;
  to: string;
  via: string | null;
  energyWh: number;
}

/** The charging schedule by day and start, local time, with names for every store and device. */
export const scheduleRows = (
  evaluation: Pick<KitEvaluation, 'schedule'>,
  lines: readonly PlanKitLine[],
): ScheduleRow[] => {
  const name = nameIn(lines);
  const counts = new Map(lines.map((line) => [line.itemId, line.count]));
  return [...evaluation.schedule]
    .sort((a, b) => a.dayIndex - b.dayIndex || Date.parse(a.start) - Date.parse(b.start))
    .map((s) => ({
      dayIndex: s.dayIndex,
      kind: s.kind,
      start: s.startLocalTime,
      end: localEnd(s.startLocalTime, s.start, s.end),
      from: unitName(s.fromName, s.fromId, counts),
      to: unitName(s.toName, s.toId, counts),
      via: s.converterItemId ? name(s.converterItemId) : null,
      energyWh: s.energyWh,
    }));
};
