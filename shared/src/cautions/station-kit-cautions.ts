import type { KitEntry, TripDevice } from '../schemas/kit.js';
import type { LeadSpec } from '../schemas/items.js';
import type { BatterySpec, ControllerSpec, TwelveVoltPanelSpec } from '../schemas/station-items.js';
import { deviceChargePowerW } from '../demand/device-demand.js';
import { deviceSupplyWindowV, joinPorts } from '../simulation/connections.js';
import { checkControllerInputVolts } from '../station/controller-input.js';
import { checkDischargeCurrent } from '../station/discharge-current.js';
import { suggestFuse } from '../station/fuse.js';
import { checkLeadDrop } from '../station/lead-drop.js';
import { packVolts } from '../station/pack-volts.js';
import { stationCautions } from '../station/station-cautions.js';
import { checkSupplyWindow } from '../station/supply-window.js';
import type { StationWarning } from '../station/types.js';
import type { TripSolarSeries } from '../sun/trip-solar-types.js';
import type { Caution } from './kit-cautions.js';

/**
 * The 12 V path's cautions and checks for a kit: the station cautions for its packs and controller (protection and
 * chemistry settings, no lithium charging below 0 °C, lead-acid gassing, controller before panel), and, for each pack
 * wired to a 12 V radio, the supply window, the discharge rating, the lead's voltage drop and a fuse suggestion; for
 * each controller and 12 V panel, the cold open-circuit voltage against its input limit. The fusing and "estimates"
 * cautions are the kit's own (`kitCautions`), so they are not repeated here.
 * @example stationKitCautions({ kit, devices }).map((c) => c.id) // ['station-lithium-protection', …, 'station-fuse-suggestion']
 */
export function stationKitCautions(input: {
  kit: readonly KitEntry[];
  devices: readonly TripDevice[];
  solar?: TripSolarSeries;
}): Caution[] {
  const packs = input.kit.filter((e): e is KitEntry & { spec: BatterySpec } => e.spec.kind === 'battery');
  const controllers = input.kit.filter((e): e is KitEntry & { spec: ControllerSpec } => e.spec.kind === 'controller');
  const panels = input.kit.filter(
    (e): e is KitEntry & { spec: TwelveVoltPanelSpec } => e.spec.kind === 'panel' && e.spec.panelType === '12v',
  );
  const leads = input.kit.filter((e): e is KitEntry & { spec: LeadSpec } => e.spec.kind === 'lead');
  const cautions: Caution[] = [];
  const fromWarning = (w: StationWarning, itemIds: string[]): Caution => ({
    id: `station-${w.id}` as Caution['id'],
    severity: w.severity,
    text: w.text,
    itemIds,
  });

  if (packs.length > 0 || controllers.length > 0) {
    for (const c of stationCautions({
      chemistries: packs.map((p) => p.spec.chemistry),
      hasController: controllers.length > 0,
      hasDcLead: false,
    })) {
      if (c.id === 'fuse-positive-near-battery' || c.id === 'defer-to-maker') continue;
      cautions.push({
        id: `station-${c.id}` as Caution['id'],
        severity: c.severity,
        text: c.text,
        itemIds: [...packs, ...controllers].map((e) => e.itemId),
      });
    }
  }

  const radios = input.devices.filter((d) => d.spec.chargesVia === '12v-dc');
  for (const pack of packs) {
    const volts = packVolts(pack.spec.chemistry, pack.spec.cellsInSeries);
    for (const radio of radios) {
      const hop = joinPorts(pack.spec.port, radio.spec.chargePort, leads);
      if (!hop.joined) continue;
      const window = deviceSupplyWindowV(radio.spec);
      const ids = [pack.itemId, radio.deviceId, ...(hop.leadItemId ? [hop.leadItemId] : [])];
      for (const w of checkSupplyWindow(volts, { minVolts: window.minV, maxVolts: window.maxV }))
        cautions.push(fromWarning(w, ids));
      // A radio run live draws its transmit current from the pack; one charged from it, its charge current.
      const chargeA = deviceChargePowerW(radio.spec) / volts.nominalVolts;
      const drawA = radio.spec.canRunLive ? Math.max(radio.spec.transmitCurrentA ?? 0, chargeA) : chargeA;
      const discharge = checkDischargeCurrent(pack.spec, drawA).warning;
      if (discharge) cautions.push(fromWarning(discharge, ids));
      const lead = leads.find((l) => l.itemId === hop.leadItemId);
      if (!lead || lead.spec.gaugeAwg === undefined) continue;
      const dc = { gaugeAwg: lead.spec.gaugeAwg, lengthM: lead.spec.lengthM };
      const drop = checkLeadDrop(dc, drawA, volts.nominalVolts, window.minV).warning;
      if (drop) cautions.push(fromWarning(drop, ids));
      const fuse = suggestFuse(Math.round(drawA * 100) / 100, {
        gaugeAwg: lead.spec.gaugeAwg,
        ...(lead.spec.fuseA !== undefined ? { fuseA: lead.spec.fuseA } : {}),
      });
      for (const w of fuse.warnings) cautions.push(fromWarning(w, ids));
      if (fuse.fuseA !== undefined) {
        cautions.push({
          id: 'station-fuse-suggestion' as Caution['id'],
          severity: 'info',
          itemIds: ids,
          text: `Fuse for this lead: ${fuse.fuseA} A (the radio draws up to ${drawA.toFixed(1)} A; 125 % of that is ${fuse.loadWithMarginA.toFixed(1)} A${fuse.leadAmpacityA !== undefined ? `, and ${lead.spec.gaugeAwg} AWG carries ${fuse.leadAmpacityA} A` : ''}). ${lead.spec.fuseA !== undefined ? `The lead has a ${lead.spec.fuseA} A fuse.` : 'The lead has no fuse yet: fit one in the positive wire, next to the pack.'}`,
        });
      }
    }
  }

  if (input.solar && controllers.length > 0 && panels.length > 0) {
    const coldestC = input.solar.steps.reduce((m, s) => Math.min(m, s.airTempC), Infinity);
    for (const c of controllers) {
      for (const p of panels) {
        const over = checkControllerInputVolts(c.spec, p.spec, coldestC).warning;
        if (over) cautions.push(fromWarning(over, [c.itemId, p.itemId]));
      }
    }
  }
  return cautions;
}
