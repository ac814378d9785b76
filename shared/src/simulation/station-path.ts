import {
  leadAcidRoundTripEfficiency,
  lithiumPackRoundTripEfficiency,
  twelveVoltAdapterInputMaxVolts,
  twelveVoltAdapterInputMinVolts,
} from '../constants/station.js';
import { deviceChargePowerW } from '../demand/device-demand.js';
import type { PanelPowerOptions } from '../harvest/panel-power.js';
import type { DeviceSpec } from '../schemas/devices.js';
import type { ControllerSpec, TwelveVoltPanelSpec } from '../schemas/station-items.js';
import type { BatterySpec } from '../schemas/station-items.js';
import { packChargeLimit } from '../station/charge-current.js';
import { controllerHarvestW, stationPanelLossFactor } from '../station/controller-harvest.js';
import { checkControllerInputVolts } from '../station/controller-input.js';
import { leadLoopResistanceOhm } from '../station/lead-drop.js';
import { packVolts, type PackVolts } from '../station/pack-volts.js';
import { packUsableWh } from '../station/usable-energy.js';
import type { TripSolarSeries } from '../sun/trip-solar-types.js';
import { cellTemperatureC } from '../temperature/cell-temperature.js';
import { deviceSupplyWindowV, joinPorts, type ChargePath, type KitConverter, type KitLead } from './connections.js';

/**
 * The 12 V path as the simulation sees it: a battery pack is one more store (usable Wh by chemistry, a round-trip
 * efficiency, an input limit from its charge C-rate and the controllers that feed it); a 12 V panel reaches it only
 * through a charge controller (PWM or MPPT harvest at the pack's nominal voltage); a 12 V radio charges — or runs
 * live — from it over a DC lead, a USB device through a 12 V → USB adapter.
 */

/** A kit's controller, by item id. */
export interface KitController {
  itemId: string;
  spec: ControllerSpec;
}

/** A battery pack as a store. */
export interface PackStore {
  volts: PackVolts;
  usableWh: number;
  /** Round-trip efficiency by chemistry, counted at the input (the output is straight DC). */
  chargeEfficiency: number;
  outputEfficiency: number;
  /** The pack's own largest charge power, W: charge C-rate × Ah × nominal volts (the controllers may cap it lower). */
  packInputMaxW: number;
}

/** Round-trip efficiency of a pack by chemistry, 0–1 (constants in `constants/station.ts`). */
export function packRoundTripEfficiency(battery: Pick<BatterySpec, 'chemistry'>): number {
  return battery.chemistry === 'lead-acid' ? leadAcidRoundTripEfficiency : lithiumPackRoundTripEfficiency;
}

/**
 * A battery pack as a store. Usable energy comes from `packUsableWh` at `drawA` (Peukert for lead-acid: the heaviest
 * steady draw of the trip's 12 V devices; the rating when none), the round trip is booked at the input, the output is
 * straight DC (its lead's loss is on the device's path).
 * @example packStore(lifepo4_4s_6ah).usableWh // 6 × 12.8 × 0.9 = 69.12
 */
export function packStore(battery: BatterySpec, drawA?: number): PackStore {
  const volts = packVolts(battery.chemistry, battery.cellsInSeries);
  return {
    volts,
    usableWh: packUsableWh(battery, drawA),
    chargeEfficiency: packRoundTripEfficiency(battery),
    outputEfficiency: 1,
    packInputMaxW: packChargeLimit(battery).maxChargeA * volts.nominalVolts,
  };
}

/**
 * A pack as a store on a trip: its usable energy taken at the heaviest steady draw of the trip's 12 V devices (their
 * charge power at the pack's nominal voltage; Peukert's law for lead-acid). The simulation and the planner both use
 * this one figure.
 */
export function tripPackStore(battery: BatterySpec, devices: readonly { spec: DeviceSpec }[]): PackStore {
  const volts = packVolts(battery.chemistry, battery.cellsInSeries).nominalVolts;
  const drawA = Math.max(
    0,
    ...devices.filter((d) => d.spec.chargesVia === '12v-dc').map((d) => deviceChargePowerW(d.spec) / volts),
  );
  return packStore(battery, drawA);
}

/** How a 12 V panel reaches a pack: through which controller and leads. */
export interface StationReach {
  controllerItemId: string;
  leadItemIds: string[];
}

/**
 * Whether a 12 V panel reaches a pack through a controller of the kit: panel → controller input and controller
 * output → pack joined (directly or by the kit's leads), and the panel's open-circuit voltage at the trip's coldest air
 * within the controller's input limit (a controller that the cold panel could destroy is never planned with).
 * Every fitting controller, best harvest first is not knowable here (it depends on the hour), so all are returned.
 */
export function panelReachesPack(
  panel: TwelveVoltPanelSpec,
  battery: BatterySpec,
  controllers: readonly KitController[],
  leads: readonly KitLead[],
  coldestAirC: number,
): StationReach[] {
  const reaches: StationReach[] = [];
  for (const c of controllers) {
    if (checkControllerInputVolts(c.spec, panel, coldestAirC).warning) continue;
    const inHop = joinPorts(panel.outputPort, c.spec.inputPort, leads);
    const outHop = joinPorts(c.spec.outputPort, battery.port, leads);
    if (!inHop.joined || !outHop.joined) continue;
    reaches.push({
      controllerItemId: c.itemId,
      leadItemIds: [inHop.leadItemId, outHop.leadItemId].filter((id): id is string => id !== null),
    });
  }
  return reaches;
}

/**
 * One 12 V panel's harvest through one controller into a pack at `batteryVolts`, W per step per sky, before the charge
 * current caps (the pack's C-rate and the controller's amps are the store's input limit): PWM or MPPT by the
 * controller (`controllerHarvestW`), with the panel's named losses, its cell temperature from the air and the light,
 * and nothing below its dropout irradiance.
 * @example stationPanelSeries(panel, controller, 12.8, solar)[0][12] // W into the pack at step 12 of the expected sky
 */
export function stationPanelSeries(
  panel: TwelveVoltPanelSpec,
  controller: ControllerSpec,
  batteryVolts: number,
  solar: TripSolarSeries,
  options: PanelPowerOptions = {},
): Float64Array[] {
  const panelLossFactor = stationPanelLossFactor();
  // The peak light of a step depends only on its air temperature: found once per distinct temperature.
  const peakByAirC = new Map<number, number>();
  return solar.skies.map((sky) => {
    const series = new Float64Array(solar.steps.length);
    for (let i = 0; i < solar.steps.length; i++) {
      const step = solar.steps[i];
      const g = sky.planeIrradianceWm2[i] ?? 0;
      if (!step || !(g > 0) || g < panel.dropoutIrradianceWm2) continue;
      const harvestAtW = (light: number): number =>
        controllerHarvestW(
          panel,
          controller,
          batteryVolts,
          { irradianceWm2: light, cellTempC: cellTemperatureC(step.airTempC, light, options.cellTemperature) },
          { panelLossFactor },
        );
      let peak = peakByAirC.get(step.airTempC);
      if (peak === undefined) {
        peak = peakLightWm2(harvestAtW, panel.dropoutIrradianceWm2);
        peakByAirC.set(step.airTempC, peak);
      }
      series[i] = harvestAtW(Math.min(g, peak));
    }
    return series;
  });
}

/** Highest light the peak search looks at, W/m²: well above any sun, so the "more sun" checks have headroom. */
const peakSearchMaxWm2 = 5000;
/** Golden-section steps: the bracket shrinks to 5000 × 0.618⁶⁰ W/m², far below any visible change in harvest. */
const peakSearchSteps = 60;

/**
 * The light at which a 12 V panel's harvest peaks at a given air temperature, W/m². More light heats the cell, and
 * through a PWM controller (or an MPPT one with the pack above the panel's hot maximum-power voltage) the harvest can
 * then fall as the panel's voltage sinks towards the pack's; a step brighter than the peak keeps the peak's harvest,
 * so harvest never falls with more sun (the solver relies on it) — optimistic only in that corner, where the pack's
 * voltage nearly matches the hot panel's. Harvest rises, then may fall (a single peak), so a golden-section search
 * finds it.
 */
function peakLightWm2(harvestAtW: (light: number) => number, fromWm2: number): number {
  const ratio = (Math.sqrt(5) - 1) / 2;
  let lo = fromWm2;
  let hi = peakSearchMaxWm2;
  let a = hi - ratio * (hi - lo);
  let b = lo + ratio * (hi - lo);
  let fa = harvestAtW(a);
  let fb = harvestAtW(b);
  for (let k = 0; k < peakSearchSteps; k++) {
    if (fa < fb) {
      lo = a;
      a = b;
      fa = fb;
      b = lo + ratio * (hi - lo);
      fb = harvestAtW(b);
    } else {
      hi = b;
      b = a;
      fb = fa;
      a = hi - ratio * (hi - lo);
      fa = harvestAtW(a);
    }
  }
  return (lo + hi) / 2;
}

/** The cache key of `stationPanelSeries` for one panel, controller and pack voltage. */
export function stationSeriesKey(panelItemId: string, controllerItemId: string, batteryVolts: number): string {
  return `${panelItemId}>${controllerItemId}@${batteryVolts.toFixed(3)}`;
}

/** Share of the power a DC lead passes at a current and voltage, 0–1: 1 − I × R_loop / V (no gauge: 1). */
export function leadPassShare(lead: KitLead | undefined, currentA: number, volts: number): number {
  if (!lead || lead.spec.gaugeAwg === undefined || !(volts > 0)) return 1;
  const lossV =
    Math.max(0, currentA) * leadLoopResistanceOhm({ gaugeAwg: lead.spec.gaugeAwg, lengthM: lead.spec.lengthM });
  return Math.max(0, 1 - lossV / volts);
}

/** A path from a pack to a device, with whether the device may run live over it (a straight DC lead). */
export interface PackPath extends ChargePath {
  live: boolean;
}

/**
 * Every path from a pack to a device with the kit's converters and leads, best first, and what is missing when there
 * is none. A 12 V DC device takes the pack straight over a DC lead when the pack's full-charge voltage is inside its
 * supply window (a pack that can rise above the window is never planned with — a 4S lithium polymer pack at 16.8 V);
 * the lead's copper loss at the charge current is the path's loss. A USB device needs a 12 V → USB adapter the pack's
 * voltage can feed. The pack's continuous discharge rating, when given, caps the power.
 */
export function packChargePaths(
  battery: BatterySpec,
  device: DeviceSpec,
  converters: readonly KitConverter[],
  leads: readonly KitLead[],
): { paths: PackPath[]; missing: { kind: 'converter' | 'lead' | 'store'; text: string }[] } {
  const volts = packVolts(battery.chemistry, battery.cellsInSeries);
  const dischargeCapW =
    battery.dischargeCRate !== undefined ? battery.dischargeCRate * battery.capacityAh * volts.nominalVolts : Infinity;
  const deviceW = deviceChargePowerW(device);
  const paths: PackPath[] = [];
  const missing: { kind: 'converter' | 'lead' | 'store'; text: string }[] = [];
  if (device.chargesVia === '12v-dc') {
    const window = deviceSupplyWindowV(device);
    if (volts.fullVolts > window.maxV + 0.05) {
      missing.push({
        kind: 'store',
        text: `a 12 V pack whose full charge stays within ${window.minV}–${window.maxV} V (this one reaches ${volts.fullVolts.toFixed(1)} V)`,
      });
      return { paths, missing };
    }
    const hop = joinPorts(battery.port, device.chargePort, leads);
    if (!hop.joined) {
      missing.push({ kind: 'lead', text: `a DC lead from ${hop.needs.fromConnector} to ${hop.needs.toConnector}` });
      return { paths, missing };
    }
    const lead = leads.find((l) => l.itemId === hop.leadItemId);
    const inputW = Math.min(deviceW, dischargeCapW);
    paths.push({
      outputPortIndex: 0,
      converterItemId: null,
      leadItemIds: hop.leadItemId ? [hop.leadItemId] : [],
      pathEfficiency: leadPassShare(lead, inputW / volts.nominalVolts, volts.nominalVolts),
      maxDeviceInputW: inputW,
      live: device.canRunLive,
    });
    return { paths, missing };
  }
  const adapterFits =
    volts.nominalVolts >= twelveVoltAdapterInputMinVolts && volts.nominalVolts <= twelveVoltAdapterInputMaxVolts;
  let anyAdapter = false;
  for (const c of converters) {
    if (c.spec.converterType !== '12v-to-usb' || !adapterFits) continue;
    anyAdapter = true;
    const inHop = joinPorts(battery.port, c.spec.inputPort, leads);
    const outHop = joinPorts(c.spec.outputPort, device.chargePort, leads);
    if (!inHop.joined || !outHop.joined) continue;
    paths.push({
      outputPortIndex: 0,
      converterItemId: c.itemId,
      leadItemIds: [inHop.leadItemId, outHop.leadItemId].filter((id): id is string => id !== null),
      pathEfficiency: c.spec.efficiency,
      maxDeviceInputW: Math.min(deviceW, c.spec.maxOutputA * c.spec.outputVolts, dischargeCapW * c.spec.efficiency),
      live: false,
    });
  }
  if (paths.length === 0 && !anyAdapter) missing.push({ kind: 'converter', text: 'a 12 V → USB adapter' });
  paths.sort((a, b) => b.pathEfficiency - a.pathEfficiency || b.maxDeviceInputW - a.maxDeviceInputW);
  return { paths, missing };
}
