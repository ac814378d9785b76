import { usbBusVolts } from '../constants/electrical.js';
import { deviceChargePowerW, deviceChargeVolts } from '../demand/device-demand.js';
import type { DeviceSpec } from '../schemas/devices.js';
import type { BankSpec, ConverterSpec, LeadSpec } from '../schemas/items.js';
import type { Connector, OutputPort, Port } from '../schemas/ports.js';

/** A lead the kit holds, by item id. */
export interface KitLead {
  itemId: string;
  spec: LeadSpec;
}

/** A converter the kit holds, by item id. */
export interface KitConverter {
  itemId: string;
  spec: ConverterSpec;
}

/** The result of joining two ports: direct (a captive cable fits), through a lead of the kit, or missing a lead. */
export type HopResult =
  | { joined: true; leadItemId: string | null }
  | { joined: false; needs: { fromConnector: Connector; toConnector: Connector } };

/** Whether a lead has these two ends (either way round): the only test `joinPorts` makes of a lead. */
const leadJoins = (lead: KitLead, a: string, b: string): boolean =>
  (lead.spec.fromConnector === a && lead.spec.toConnector === b) ||
  (lead.spec.fromConnector === b && lead.spec.toConnector === a);

/**
 * Joins a source port to a sink port. A captive cable on exactly one side whose plug is the other side's connector
 * joins them directly; otherwise the hop needs a lead with those two ends (either way round). Our rule, stated in the
 * README; two captive plugs never mate.
 * @example joinPorts({ connector: 'usb-a', captiveCable: true }, { connector: 'usb-a', captiveCable: false }, []) // { joined: true, leadItemId: null }
 */
export function joinPorts(from: Port, to: Port, leads: readonly KitLead[]): HopResult {
  if (from.captiveCable !== to.captiveCable && from.connector === to.connector)
    return { joined: true, leadItemId: null };
  for (const lead of leads)
    if (leadJoins(lead, from.connector, to.connector)) return { joined: true, leadItemId: lead.itemId };
  return { joined: false, needs: { fromConnector: from.connector, toConnector: to.connector } };
}

/** One way to charge a device from a store: the store port, an optional converter and the leads of each hop. */
export interface ChargePath {
  outputPortIndex: number;
  converterItemId: string | null;
  leadItemIds: string[];
  /** Efficiency after the store's output (the converter's; 1 when there is none). */
  pathEfficiency: number;
  /** Most power the path can put into the device's charge input, W. */
  maxDeviceInputW: number;
}

/** Something a device's charging path lacks. */
export interface MissingLink {
  kind: 'store' | 'converter' | 'lead';
  /** Plain sentence for the plan. */
  text: string;
  fromConnector?: Connector;
  toConnector?: Connector;
}

const voltsTolerance = 0.05;

function portOffersVolts(port: OutputPort, volts: number): boolean {
  return (
    Math.abs(port.volts - volts) <= voltsTolerance || port.usbPdVolts.some((v) => Math.abs(v - volts) <= voltsTolerance)
  );
}

/** Power a USB port gives at a voltage it offers, W (volts × max amps). */
function portPowerAtW(port: OutputPort, volts: number): number {
  return volts * port.maxA;
}

/**
 * Whether a boost converter can charge a 12 V device from this port: the port offers the converter's input voltage
 * and the converter's output lies in the device's supply window (within 0.05 V).
 */
function boostFitsPort(port: OutputPort, c: ConverterSpec, window: { minV: number; maxV: number }): boolean {
  return (
    c.converterType === 'boost' &&
    portOffersVolts(port, c.inputVolts) &&
    c.outputVolts >= window.minV - voltsTolerance &&
    c.outputVolts <= window.maxV + voltsTolerance
  );
}

/**
 * Whether a boost converter can charge a 12 V device from some port of this bank (else no lead set gives a path).
 * @example boostFitsBank(bank, radio, boost) // true when a port offers the boost's input volts
 */
export function boostFitsBank(bank: BankSpec, device: DeviceSpec, c: ConverterSpec): boolean {
  const window = deviceSupplyWindowV(device);
  return bank.outputPorts.some((port) => boostFitsPort(port, c, window));
}

/** The supply window a 12 V device accepts, V (default 11–14.6 V: a 13.8 V nominal radio's usual range — common practice). */
export function deviceSupplyWindowV(device: DeviceSpec): { minV: number; maxV: number } {
  return { minV: device.supplyVoltsMin ?? 11, maxV: device.supplyVoltsMax ?? 14.6 };
}

/**
 * Every charging path from a bank to a device with this kit's converters and leads, best first (highest path
 * efficiency, then most power), and what is missing when there is none. USB devices charge from a bank port directly
 * (a USB PD device at its PD voltage where the port offers it, else at 5 V); a 12 V DC device needs a boost converter
 * whose input the port offers and whose output is inside the device's supply window.
 */
export function chargePaths(
  bank: BankSpec,
  device: DeviceSpec,
  converters: readonly KitConverter[],
  leads: readonly KitLead[],
): { paths: ChargePath[]; missing: MissingLink[] } {
  const paths: ChargePath[] = [];
  const missingLeads = new Map<string, MissingLink>();
  const deviceW = deviceChargePowerW(device);
  const noteLead = (needs: { fromConnector: Connector; toConnector: Connector }) => {
    const key = [needs.fromConnector, needs.toConnector].sort().join('|');
    if (!missingLeads.has(key)) {
      missingLeads.set(key, {
        kind: 'lead',
        text: `a lead from ${needs.fromConnector} to ${needs.toConnector}`,
        fromConnector: needs.fromConnector,
        toConnector: needs.toConnector,
      });
    }
  };
  let fittingConverter = false;
  bank.outputPorts.forEach((port, portIndex) => {
    if (device.chargesVia === 'usb-5v' || device.chargesVia === 'usb-pd') {
      if (!portOffersVolts(port, usbBusVolts)) return;
      const volts =
        device.chargesVia === 'usb-pd' && portOffersVolts(port, deviceChargeVolts(device))
          ? deviceChargeVolts(device)
          : usbBusVolts;
      const hop = joinPorts(port, device.chargePort, leads);
      if (!hop.joined) return noteLead(hop.needs);
      // A PD device on a 5 V-only port charges at 5 V × the port's amps at most.
      paths.push({
        outputPortIndex: portIndex,
        converterItemId: null,
        leadItemIds: hop.leadItemId ? [hop.leadItemId] : [],
        pathEfficiency: 1,
        maxDeviceInputW: Math.min(deviceW, portPowerAtW(port, volts)),
      });
      return;
    }
    const window = deviceSupplyWindowV(device);
    for (const converter of converters) {
      const c = converter.spec;
      if (!boostFitsPort(port, c, window)) continue;
      fittingConverter = true;
      const inHop = joinPorts(port, c.inputPort, leads);
      const outHop = joinPorts(c.outputPort, device.chargePort, leads);
      if (!inHop.joined) noteLead(inHop.needs);
      if (!outHop.joined) noteLead(outHop.needs);
      if (!inHop.joined || !outHop.joined) continue;
      paths.push({
        outputPortIndex: portIndex,
        converterItemId: converter.itemId,
        leadItemIds: [inHop.leadItemId, outHop.leadItemId].filter((id): id is string => id !== null),
        pathEfficiency: c.efficiency,
        maxDeviceInputW: Math.min(
          deviceW,
          c.maxOutputA * c.outputVolts,
          portPowerAtW(port, c.inputVolts) * c.efficiency,
        ),
      });
    }
  });
  paths.sort((a, b) => b.pathEfficiency - a.pathEfficiency || b.maxDeviceInputW - a.maxDeviceInputW);
  const missing: MissingLink[] = [];
  if (paths.length === 0) {
    if (device.chargesVia === '12v-dc' && !fittingConverter) {
      const window = deviceSupplyWindowV(device);
      missing.push({
        kind: 'converter',
        text: `a boost converter from a USB voltage this bank offers to ${window.minV}–${window.maxV} V`,
      });
    }
    missing.push(...missingLeads.values());
  }
  return { paths, missing };
}

/** Whether a panel's port reaches a bank's input, and through which lead. */
export function panelReachesBank(panelPort: Port, bank: BankSpec, leads: readonly KitLead[]): HopResult {
  return joinPorts(panelPort, bank.inputPort, leads);
}

/**
 * Whether a lead set can give a device's path from a bank with these port connectors a tail that a smaller set does
 * not: every lead of it must join a hop of the path — a bank port to the device, or with a converter, a bank port to
 * its input or its output to the device — and a pair only gives something new with a lead on each hop. A path through
 * a set that leaves a lead unused is the path of the smaller set, which is searched too. Every port counts, whatever
 * volts it offers, so the test may keep a set that gives nothing new but never skips one that does. At 200 items the
 * lead sets made 94,000 path searches per trip; 23,000 with this test (10,700 with `boostFitsBank` too), and the same
 * paths are found (`lead-sets.test.ts`).
 * @example leadSetMayAddTail([usbCToUsbC], ['usb-a'], undefined, 'usb-c') // false: no port of this bank is USB-C
 */
export function leadSetMayAddTail(
  leads: readonly KitLead[],
  portConnectors: readonly string[],
  converter: KitConverter | undefined,
  deviceConnector: string,
): boolean {
  const fromPort = (l: KitLead, to: string): boolean => portConnectors.some((p) => leadJoins(l, p, to));
  if (!converter) return leads.length <= 1 && leads.every((l) => fromPort(l, deviceConnector));
  const into = (l: KitLead): boolean => fromPort(l, converter.spec.inputPort.connector);
  const out = (l: KitLead): boolean => leadJoins(l, converter.spec.outputPort.connector, deviceConnector);
  if (leads.length <= 1) return leads.every((l) => into(l) || out(l));
  const [a, b] = leads as [KitLead, KitLead];
  return leads.length === 2 && ((into(a) && out(b)) || (into(b) && out(a)));
}
