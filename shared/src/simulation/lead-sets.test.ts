import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { bankArb, converterArb, deviceArb, leadArb } from '../testing/arbitraries.js';
import { testBank, testBoostConverter, testLead, testPhone, testRadio } from '../testing/fixtures.js';
import { boostFitsBank, chargePaths, leadSetMayAddTail, type KitConverter, type KitLead } from './connections.js';
import type { BankSpec } from '../schemas/items.js';
import type { DeviceSpec } from '../schemas/devices.js';

/** What the planner reads of a path: the items besides the bank (sorted, each once) and the path's efficiency. */
function tailsOf(bank: BankSpec, device: DeviceSpec, converters: KitConverter[], leads: KitLead[]): Set<string> {
  return new Set(
    chargePaths(bank, device, converters, leads).paths.map((p) => {
      const ids = [...new Set([...(p.converterItemId ? [p.converterItemId] : []), ...p.leadItemIds])].sort();
      return `${ids.join('+')} @ ${p.pathEfficiency}`;
    }),
  );
}

/** The lead set's proper subsets (its leads one at a time, and none). */
const smallerSets = (leads: KitLead[]): KitLead[][] => [[], ...(leads.length > 1 ? leads.map((l) => [l]) : [])];

describe('lead sets a path search can skip (leadSetMayAddTail)', () => {
  // The planner searches a device's paths once per converter and lead set (none, each lead, and for a 12 V device each
  // pair of a lead into a converter and one out of it), and skips the sets this test rules out. A skipped set must find
  // nothing that its smaller sets miss, or the model would lose a charging path.
  it('a set it rules out finds no path that a smaller set misses', () => {
    fc.assert(
      fc.property(bankArb, deviceArb, converterArb, leadArb, leadArb, (bank, device, converterSpec, a, b) => {
        const converters: KitConverter[] =
          device.chargesVia === '12v-dc' ? [{ itemId: 'converter', spec: converterSpec }] : [];
        const pair: KitLead[] = [
          { itemId: 'lead-a', spec: a },
          { itemId: 'lead-b', spec: b },
        ];
        const ports = bank.outputPorts.map((p) => p.connector);
        for (const set of [[pair[0] as KitLead], [pair[1] as KitLead], pair]) {
          if (leadSetMayAddTail(set, ports, converters[0], device.chargePort.connector)) continue;
          const found = tailsOf(bank, device, converters, set);
          const fromSmaller = new Set(smallerSets(set).flatMap((s) => [...tailsOf(bank, device, converters, s)]));
          for (const tail of found) expect(fromSmaller).toContain(tail);
        }
      }),
      { numRuns: 3000, seed: 20261204 },
    );
  });

  it('a converter that fits no port of the bank gives no path with any leads', () => {
    fc.assert(
      fc.property(
        bankArb,
        deviceArb,
        converterArb,
        fc.array(leadArb, { maxLength: 3 }),
        (bank, device, spec, leads) => {
          if (device.chargesVia !== '12v-dc' || boostFitsBank(bank, device, spec)) return;
          const kitLeads = leads.map((l, i): KitLead => ({ itemId: `lead-${i}`, spec: l }));
          expect(chargePaths(bank, device, [{ itemId: 'converter', spec }], kitLeads).paths).toEqual([]);
        },
      ),
      { numRuns: 2000, seed: 20261204 },
    );
    // And one that fits is told apart: a 9 V boost fits a bank with a 9 V USB PD port, not one whose ports give 5 V only.
    const nineVolt = testBoostConverter({ inputVolts: 9 });
    expect(boostFitsBank(testBank(), testRadio(), nineVolt)).toBe(true);
    const fiveVoltOnly = testBank({
      outputPorts: [{ connector: 'usb-a', captiveCable: false, volts: 5, maxA: 2.4, usbPdVolts: [] }],
    });
    expect(boostFitsBank(fiveVoltOnly, testRadio(), nineVolt)).toBe(false);
  });

  it('keeps the sets that give a path of their own, and skips a lead no hop can use', () => {
    const bank = testBank(); // USB-A and USB-C ports, no captive cables
    const usbAToUsbC: KitLead = { itemId: 'a-c', spec: testLead('usb-a', 'usb-c') };
    const barrelToBarrel: KitLead = { itemId: 'barrel', spec: testLead('barrel-5.5x2.1', 'barrel-5.5x2.1') };
    const ports = bank.outputPorts.map((p) => p.connector);
    // A phone with a USB-C input: the USB-A to USB-C lead joins a bank port to it; a barrel lead joins nothing.
    expect(leadSetMayAddTail([usbAToUsbC], ports, undefined, 'usb-c')).toBe(true);
    expect(leadSetMayAddTail([barrelToBarrel], ports, undefined, 'usb-c')).toBe(false);
    expect(tailsOf(bank, testPhone(), [], [barrelToBarrel])).toEqual(tailsOf(bank, testPhone(), [], []));
    // A radio behind a boost converter with a USB-A input and a barrel output, neither captive: the pair with one lead
    // on each hop is the only set that charges it, and is kept; the same lead twice is not a pair.
    const boost: KitConverter = {
      itemId: 'boost',
      spec: testBoostConverter({
        inputPort: { connector: 'usb-a', captiveCable: false },
        outputPort: { connector: 'barrel-5.5x2.1', captiveCable: false },
      }),
    };
    const radio = testRadio({ chargePort: { connector: 'barrel-5.5x2.1', captiveCable: false } });
    const usbAToUsbA: KitLead = { itemId: 'a-a', spec: testLead('usb-a', 'usb-a') };
    expect(leadSetMayAddTail([usbAToUsbA, barrelToBarrel], ports, boost, 'barrel-5.5x2.1')).toBe(true);
    expect(tailsOf(bank, radio, [boost], [usbAToUsbA, barrelToBarrel]).size).toBe(1);
    expect(tailsOf(bank, radio, [boost], [usbAToUsbA]).size).toBe(0);
    // A micro-USB lead fits no hop of that path: with the barrel lead it is no pair, and alone it is skipped.
    const microToUsbC: KitLead = { itemId: 'micro-c', spec: testLead('micro-usb', 'usb-c') };
    expect(leadSetMayAddTail([microToUsbC, barrelToBarrel], ports, boost, 'barrel-5.5x2.1')).toBe(false);
    expect(leadSetMayAddTail([microToUsbC], ports, boost, 'barrel-5.5x2.1')).toBe(false);
  });
});
