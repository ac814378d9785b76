import {
  airlineApprovalAboveWh,
  airlineForbiddenAboveWh,
  lithiumHeatCautionAirTemperatureC,
  lithiumMinChargeTemperatureC,
} from '../constants/electrical.js';
import type { KitEntry, TripDevice } from '../schemas/kit.js';
import type { Connector } from '../schemas/ports.js';
import type { KitSimulation } from '../simulation/types.js';
import { bankRatedWh } from '../storage/bank.js';
import { stationKitCautions } from './station-kit-cautions.js';
import type { TripSolarSeries } from '../sun/trip-solar-types.js';

/** How strongly a caution is shown. */
export type CautionSeverity = 'info' | 'warning' | 'danger';

/** Which caution it is (stable ids the screens and e-mails can key on). */
export type CautionId =
  | 'lithium'
  | 'freezing'
  | 'heat'
  | 'boost-noise'
  | 'licence'
  | 'airline-approval'
  | 'airline-forbidden'
  | 'dc-fusing'
  | 'thin-margin'
  | 'estimates'
  /** The 12 V path's cautions and checks (`station-kit-cautions.ts`), e.g. `station-lithium-protection`. */
  | `station-${string}`;

/** One caution: an id, a severity and our own plain wording. */
export interface Caution {
  id: CautionId;
  severity: CautionSeverity;
  text: string;
  /** Kit item or device ids it is about, when it is about some. */
  itemIds: string[];
}

/** What the cautions look at; the trip's sun series and the simulation are optional. */
export interface KitCautionInput {
  kit: readonly KitEntry[];
  devices: readonly TripDevice[];
  solar?: TripSolarSeries;
  simulation?: KitSimulation;
}

/** A share of storage above the reserve below which the plan calls the margin thin (0–1; a planning choice). */
export const thinMarginShare = 0.15;

const dcConnectors: ReadonlySet<Connector> = new Set([
  'barrel-5.5x2.1',
  'barrel-5.5x2.5',
  '12v-accessory',
  'ring-terminal',
  'radio-dc',
]);

/**
 * The cautions that apply to a kit on a trip, most serious first. The wording is ours; each defers to the
 * manufacturer, local rules and licensed practice. Airline limits per the IATA Lithium Battery Guidance Document
 * (passengers: over 100 Wh needs the airline's approval, over 160 Wh may not be carried).
 * @example kitCautions({ kit, devices }).map((c) => c.id) // ['lithium', 'licence', 'estimates']
 */
export function kitCautions(input: KitCautionInput): Caution[] {
  const { kit, devices, solar, simulation } = input;
  const cautions: Caution[] = [];
  const banks = kit.filter((e) => e.spec.kind === 'bank');
  const lithiumPacks = kit.filter((e) => e.spec.kind === 'battery' && e.spec.chemistry !== 'lead-acid');
  const hasLithium = banks.length > 0 || lithiumPacks.length > 0 || devices.some((d) => d.spec.ownBatteryWh > 0);

  for (const entry of banks) {
    if (entry.spec.kind !== 'bank') continue;
    const ratedWh = bankRatedWh(entry.spec);
    if (ratedWh > airlineForbiddenAboveWh) {
      cautions.push({
        id: 'airline-forbidden',
        severity: 'danger',
        itemIds: [entry.itemId],
        text: `This bank is rated ${Math.round(ratedWh)} Wh: over ${airlineForbiddenAboveWh} Wh, passengers may not carry it on a plane (IATA guidance). Plan to travel to the trailhead without flying it, or leave it out.`,
      });
    } else if (ratedWh > airlineApprovalAboveWh) {
      cautions.push({
        id: 'airline-approval',
        severity: 'warning',
        itemIds: [entry.itemId],
        text: `This bank is rated ${Math.round(ratedWh)} Wh: over ${airlineApprovalAboveWh} Wh it needs the airline's approval before you fly with it, in the cabin only (IATA guidance).`,
      });
    }
  }

  if (solar && hasLithium) {
    let frozenH = 0;
    for (const step of solar.steps) if (step.airTempC < lithiumMinChargeTemperatureC) frozenH += step.durationH;
    if (frozenH > 0) {
      cautions.push({
        id: 'freezing',
        severity: 'warning',
        itemIds: [...banks, ...lithiumPacks].map((b) => b.itemId),
        text: `The air is below freezing for about ${Math.round(frozenH)} hours of this trip. Never charge lithium cells below 0 °C: keep banks and devices in a pocket or sleeping bag and charge them only once they are warm. The plan does not charge banks from the panel in those hours.`,
      });
    }
  }

  if (hasLithium) {
    const hot = solar ? Math.max(...solar.days.map((d) => d.highC)) : -Infinity;
    const hasPanel = kit.some((e) => e.spec.kind === 'panel');
    if (hot >= lithiumHeatCautionAirTemperatureC || (hasPanel && banks.length > 0)) {
      cautions.push({
        id: 'heat',
        severity: hot >= lithiumHeatCautionAirTemperatureC ? 'warning' : 'info',
        itemIds: banks.map((b) => b.itemId),
        text: 'Never leave a bank cooking in the sun: keep it in the shade of the panel or inside the pack while it charges, and let a hot bank cool before charging it.',
      });
    }
    cautions.push({
      id: 'lithium',
      severity: 'warning',
      itemIds: [...banks.map((b) => b.itemId), ...devices.map((d) => d.deviceId)],
      text: 'Lithium batteries can burn. Use protected packs and the charger they were made for, and stop using one that is swollen, hot or damaged.',
    });
  }

  const boosts = kit.filter((e) => e.spec.kind === 'converter' && e.spec.converterType === 'boost');
  if (boosts.length > 0) {
    cautions.push({
      id: 'boost-noise',
      severity: 'info',
      itemIds: boosts.map((b) => b.itemId),
      text: 'Boost converters can make radio noise: charge the radio while you are not operating it.',
    });
  }

  const dcLeads = kit.filter(
    (e) => e.spec.kind === 'lead' && (dcConnectors.has(e.spec.fromConnector) || dcConnectors.has(e.spec.toConnector)),
  );
  const dcDevices = devices.filter((d) => d.spec.chargesVia === '12v-dc');
  const packs = kit.filter((e) => e.spec.kind === 'battery');
  if (dcLeads.length > 0 || packs.length > 0 || (dcDevices.length > 0 && boosts.length > 0)) {
    cautions.push({
      id: 'dc-fusing',
      severity: 'warning',
      itemIds: [...dcLeads.map((l) => l.itemId), ...packs.map((p) => p.itemId), ...dcDevices.map((d) => d.deviceId)],
      text: 'Fuse DC leads on the positive side, close to the battery, and check the polarity of every plug before connecting.',
    });
  }

  const radios = devices.filter((d) => d.spec.deviceKind === 'radio');
  if (radios.length > 0) {
    cautions.push({
      id: 'licence',
      severity: 'info',
      itemIds: radios.map((r) => r.deviceId),
      text: 'Transmitting needs the licence the law of the place requires, and the bands and powers it allows. Follow licensed practice.',
    });
  }

  if (simulation && simulation.verdict.status !== 'runs-dry' && simulation.verdict.worstMarginShare < thinMarginShare) {
    cautions.push({
      id: 'thin-margin',
      severity: 'warning',
      itemIds: [],
      text: `On the worst day this kit has only ${Math.round(simulation.verdict.worstMarginShare * 100)} % of its storage to spare above the reserve. A longer cloudy spell, a cold snap or more use than planned could empty it.`,
    });
  }

  cautions.push(...stationKitCautions({ kit, devices, ...(solar ? { solar } : {}) }));

  cautions.push({
    id: 'estimates',
    severity: 'info',
    itemIds: [],
    text: 'These figures are estimates, not a guarantee: carry a margin. Defer to the manufacturer, local rules and licensed practice.',
  });

  const rank: Record<CautionSeverity, number> = { danger: 0, warning: 1, info: 2 };
  return cautions.sort((a, b) => rank[a.severity] - rank[b.severity]);
}
