import { kitCautions } from '../cautions/kit-cautions.js';
import type { KitCounts } from '../optimisation/types.js';
import type { KitEvaluation, PlanKit, PlanVerdict } from '../schemas/plans.js';
import type { KitSimulation, SkySimulation } from '../simulation/types.js';
import type { PlanningContext } from './build-problem.js';

const iso = (ms: number): string => new Date(ms).toISOString();

/**
 * A kit's lines with names and grams, against the gram limit.
 * @example planKit(context, new Map([['bank-1', 2]])).massG // 2 × the bank's grams
 */
export function planKit(context: PlanningContext, counts: KitCounts): PlanKit {
  const lines = [...counts]
    .filter(([, n]) => n > 0)
    .flatMap(([itemId, count]) => {
      const g = context.gearById.get(itemId);
      return g ? [{ itemId, name: g.name, kind: g.spec.kind, count, unitMassG: g.massG, massG: g.massG * count }] : [];
    })
    .sort(
      (a, b) => kindOrder(a.kind) - kindOrder(b.kind) || a.name.localeCompare(b.name) || (a.itemId < b.itemId ? -1 : 1),
    );
  const massG = lines.reduce((sum, l) => sum + l.massG, 0);
  const limit = context.input.gramLimitG;
  return { lines, massG, gramLimitG: limit, overLimitG: limit !== null && massG > limit ? massG - limit : null };
}

function kindOrder(kind: string): number {
  return ['panel', 'bank', 'converter', 'lead'].indexOf(kind);
}

/** The design sky the verdict turns on: the one that runs dry (earliest), else the one with the least margin. */
function bindingSky(simulation: KitSimulation): SkySimulation {
  const dry = simulation.skies
    .filter((s) => s.dry)
    .sort((a, b) => (a.dry?.stepIndex ?? 0) - (b.dry?.stepIndex ?? 0))[0];
  if (dry) return dry;
  return [...simulation.skies].sort((a, b) => a.worstMarginShare - b.worstMarginShare)[0] as SkySimulation;
}

function verdictOf(simulation: KitSimulation): PlanVerdict {
  const v = simulation.verdict;
  if (v.status === 'runs-dry')
    return {
      status: v.status,
      text: v.text,
      dayIndex: v.dayIndex,
      deviceId: v.deviceId,
      worstMarginShare: null,
      wouldRunDryOnDayIndex: null,
    };
  return {
    status: v.status,
    text: v.text,
    dayIndex: null,
    deviceId: null,
    worstMarginShare: v.worstMarginShare,
    wouldRunDryOnDayIndex: v.status === 'lasts-trip' ? v.wouldRunDryOnDayIndex : null,
  };
}

/**
 * Simulates a kit on the trip and shapes what the plan page shows: the verdict, the day strip of the binding sky, the
 * ledgers of the binding and expected skies, hourly stored energy, the expected sky's daily harvest against demand,
 * the sun's path on the first and last day, the camp charging schedule and the cautions.
 * @example evaluateKit(context, counts).verdict.text // 'Keeps up: 31 % to spare on the worst day'
 */
export function evaluateKit(context: PlanningContext, counts: KitCounts): KitEvaluation {
  const { solar } = context;
  const simulation = context.simulate(counts);
  const binding = bindingSky(simulation);
  const expected = simulation.skies[0] as SkySimulation;
  const storageWh = simulation.stores.reduce((sum, s) => sum + s.usableWh, 0);
  const deviceWh = simulation.devices.reduce((sum, d) => sum + d.ownBatteryWh, 0);
  const totalWh = storageWh + deviceWh;
  const lastStepOfDay = new Map<number, number>();
  solar.steps.forEach((s, i) => lastStepOfDay.set(s.dayIndex, i));
  const dryDay = binding.dry?.dayIndex ?? Infinity;
  const dayStrip = solar.days.map((day) => {
    const storedEndWh = binding.storedWhByStep[lastStepOfDay.get(day.dayIndex) ?? 0] ?? 0;
    return {
      dayIndex: day.dayIndex,
      date: day.dateLocal,
      storedEndWh,
      storedEndShare: totalWh > 0 ? Math.min(1, Math.max(0, storedEndWh / totalWh)) : 0,
      dry: day.dayIndex >= dryDay,
    };
  });
  const skiesShown = binding.skyId === expected.skyId ? [expected] : [binding, expected];
  const names = (id: string): string => {
    const itemId = id.split('#')[0] ?? id;
    return context.gearById.get(itemId)?.name ?? context.input.deviceNames?.[id] ?? id;
  };
  const sunPath = (dayIndex: number) => ({
    dayIndex,
    date: solar.days[dayIndex]?.dateLocal ?? '',
    points: solar.steps
      .filter((s) => s.dayIndex === dayIndex)
      .map((s) => ({
        t: iso(s.startUtcMs),
        localTime: s.localTime,
        altitudeDeg: s.sunAltitudeDeg,
        azimuthDeg: s.sunAzimuthDeg,
      })),
  });
  const lastDay = solar.days.length - 1;
  return {
    verdict: verdictOf(simulation),
    bindingSkyId: binding.skyId,
    dayStrip,
    ledgers: skiesShown.map((s) => ({ skyId: s.skyId, days: s.ledger })),
    storedSeries: skiesShown.map((s) => ({
      skyId: s.skyId,
      points: solar.steps.map((step, i) => ({
        t: iso(step.startUtcMs + step.durationH * 3_600_000),
        storedWh: s.storedWhByStep[i] ?? 0,
      })),
    })),
    dailyBalance: expected.ledger.map((d) => ({
      dayIndex: d.dayIndex,
      date: solar.days[d.dayIndex]?.dateLocal ?? '',
      harvestWh: d.harvestWh,
      demandWh: d.deliveredWh + d.unmetWh,
    })),
    sunPaths: lastDay > 0 ? [sunPath(0), sunPath(lastDay)] : [sunPath(0)],
    schedule: simulation.schedule.map((s) => ({
      kind: s.kind,
      dayIndex: s.dayIndex,
      fromId: s.fromId,
      toId: s.toId,
      fromName: names(s.fromId),
      toName: names(s.toId),
      converterItemId: s.converterItemId,
      leadItemIds: s.leadItemIds,
      startLocalTime: s.startLocalTime,
      start: iso(s.startUtcMs),
      end: iso(s.endUtcMs),
      energyWh: s.energyWh,
    })),
    cautions: kitCautions({ kit: context.kitEntries(counts), devices: context.input.devices, solar, simulation }).map(
      (c) => ({ id: c.id, severity: c.severity, text: c.text }),
    ),
    unusedItemIds: simulation.unusedItemIds,
    massG: planKit(context, counts).massG,
    storageWh,
  };
}
