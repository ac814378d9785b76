import { describe, expect, it } from 'vitest';
import { isKitFeasible, simulateKit } from './simulate-kit.js';
import type { KitEntry, TripDevice } from '../schemas/kit.js';
import type { OutputPort } from '../schemas/ports.js';
import type { KitSimulation } from './types.js';
import { scaleSolar, syntheticTripSolar, type SyntheticSolarOptions } from '../testing/synthetic-solar.js';
import { testBank, testBoostConverter, testLead, testPhone, testRadio, testUsbPanel } from '../testing/fixtures.js';

// Hand-built families of kits where a simpler dispatch rule let an added item make a kit worse. Each family sweeps a
// grid; the check is that no feasible kit turns infeasible when the item is added, on a grid where the base kit is
// often feasible (so the check is not empty). They pin the dispatch rule described in the README.

const port = (connector: OutputPort['connector']): OutputPort => ({
  connector,
  captiveCable: false,
  volts: 5,
  maxA: 2,
  usbPdVolts: [],
});

function sweep(
  make: (p: Record<string, number>) => { kit: KitEntry[]; added: KitEntry; devices: TripDevice[]; nights: number },
  grid: Record<string, number[]>,
) {
  const keys = Object.keys(grid);
  let feasibleBase = 0;
  const broken: Record<string, number>[] = [];
  const walk = (i: number, p: Record<string, number>) => {
    if (i === keys.length) {
      const { kit, added, devices, nights } = make(p);
      const solar = syntheticTripSolar({
        nights,
        cloudyShare: 0.3,
        walkStartHour: p.walkStart ?? 8,
        walkEndHour: p.walkEnd ?? 16,
        ...(p.lowC !== undefined ? { lowC: p.lowC } : {}),
        ...(p.highC !== undefined ? { highC: p.highC } : {}),
      });
      if (!isKitFeasible({ solar, kit, devices, reserveShare: 0 })) return;
      feasibleBase++;
      if (!isKitFeasible({ solar, kit: [...kit, added], devices, reserveShare: 0 })) broken.push({ ...p });
      return;
    }
    const key = keys[i] ?? '';
    for (const v of grid[key] ?? []) walk(i + 1, { ...p, [key]: v });
  };
  walk(0, {});
  return { feasibleBase, broken };
}

describe('adding an item never makes a kit worse: hand-built cases', () => {
  it('a bank only a device that needs no charging can reach does not pull harvest from the bank the phone needs', () => {
    // Merit-order harvest with top-ups of every device failed here: the headlamp drained the new bank, which then
    // took the panel's harvest ahead of the phone's bank.
    const { feasibleBase, broken } = sweep(
      (p) => {
        const phoneBank = testBank({
          capacityMah: p.cap,
          chargeEfficiency: p.eff,
          outputEfficiency: 0.8,
          inputMaxW: 10,
          outputPorts: [port('usb-a')],
        });
        const lampBank = testBank({
          capacityMah: 20000,
          chargeEfficiency: 0.95,
          outputEfficiency: 0.95,
          outputPorts: [port('micro-usb')],
        });
        const lamp = testPhone(0.02, {
          deviceKind: 'headlamp',
          ownBatteryWh: 40,
          chargePort: { connector: 'micro-usb', captiveCable: true },
        });
        return {
          nights: p.nights ?? 3,
          devices: [
            { deviceId: 'phone', spec: testPhone(p.share ?? 0) },
            { deviceId: 'lamp', spec: lamp },
          ],
          kit: [
            { itemId: 'phone-bank', count: 1, spec: phoneBank },
            { itemId: 'lead', count: 1, spec: testLead('usb-a', 'usb-c') },
            {
              itemId: 'panel',
              count: 1,
              spec: testUsbPanel({ ratedW: p.w, outputPort: { connector: 'usb-c', captiveCable: true } }),
            },
          ],
          added: { itemId: 'lamp-bank', count: 1, spec: lampBank },
        };
      },
      {
        nights: [3, 6, 10],
        cap: [2000, 3000, 5000, 8000],
        share: [0.4, 0.6, 0.8, 1, 1.3],
        w: [3, 6, 10, 20],
        eff: [0.6, 0.8],
      },
    );
    expect(feasibleBase).toBeGreaterThan(50);
    expect(broken).toEqual([]);
  }, 60_000);

  it('a lead that lets one device also reach another device’s bank does not drain that bank (found by a soak)', () => {
    // No sun. The lamp charges from its own bank, the phone from the phone bank; the added USB-C lead joins the lamp's
    // captive USB-C plug to the phone bank's captive USB-C cable (two plugs never mate), so the lamp can reach the phone
    // bank too, while the phone still cannot reach the lamp bank. Topped up to full from every bank it reached in merit
    // order, the lamp took the phone bank's energy — first in merit order (phone bank 0.9 × 0.8 efficient) or, behind
    // its own bank (0.7 × 0.8), once that was empty, energy its battery did not need for the rest of the trip — and the
    // phone, on a bank just big enough without the lead, ran dry.
    const phoneBankOf = (capacityMah: number, chargeEfficiency: number) =>
      testBank({
        capacityMah,
        chargeEfficiency,
        outputEfficiency: 0.8,
        outputPorts: [port('usb-a'), { ...port('usb-c'), captiveCable: true }],
      });
    const lampBank = testBank({
      capacityMah: 2000,
      chargeEfficiency: 0.8,
      outputEfficiency: 0.8,
      outputPorts: [port('usb-c')],
    });
    const lead: KitEntry = { itemId: 'lead', count: 1, spec: testLead('usb-c', 'usb-c') };
    let feasibleBase = 0;
    const broken: Record<string, number>[] = [];
    for (const nights of [2, 4, 7]) {
      const solar = syntheticTripSolar({ nights, peakWm2: 0 });
      for (const lampShare of [0.25, 0.5, 1]) {
        for (const phoneShare of [0.3, 0.6]) {
          for (const phoneEff of [0.7, 0.9]) {
            const devices: TripDevice[] = [
              {
                deviceId: 'lamp',
                spec: testPhone(lampShare, {
                  deviceKind: 'headlamp',
                  ownBatteryWh: 4,
                  chargePowerW: 2,
                  chargePort: { connector: 'usb-c', captiveCable: true },
                }),
              },
              {
                deviceId: 'phone',
                spec: testPhone(phoneShare, {
                  ownBatteryWh: 10,
                  chargePort: { connector: 'usb-a', captiveCable: true },
                }),
              },
            ];
            const kitWith = (phoneCapMah: number): KitEntry[] => [
              { itemId: 'phone-bank', count: 1, spec: phoneBankOf(phoneCapMah, phoneEff) },
              { itemId: 'lamp-bank', count: 1, spec: lampBank },
            ];
            const feasible = (kit: KitEntry[]) => isKitFeasible({ solar, kit, devices, reserveShare: 0 });
            // The smallest phone bank with which the kit without the lead lasts (bisection), then banks just above it.
            let lo = 100;
            let hi = 40_000;
            if (!feasible(kitWith(hi))) continue;
            for (let i = 0; i < 40; i++) {
              const mid = (lo + hi) / 2;
              if (feasible(kitWith(mid))) hi = mid;
              else lo = mid;
            }
            for (const aboveMah of [0.01, 1, 10, 100, 300, 1000]) {
              const kit = kitWith(hi + aboveMah);
              if (!feasible(kit)) continue;
              feasibleBase++;
              if (!feasible([...kit, lead])) broken.push({ nights, lampShare, phoneShare, phoneEff, aboveMah });
            }
          }
        }
      }
    }
    expect(feasibleBase).toBe(120);
    expect(broken).toEqual([]);
  }, 60_000);

  it('a better bank for one device does not take the harvest another device’s bank needs', () => {
    // Merit-order harvest failed here: the new efficient bank, reachable only by the headlamp, outranked the phone's bank.
    const { feasibleBase, broken } = sweep(
      (p) => {
        const phoneBank = testBank({
          capacityMah: p.cap,
          chargeEfficiency: 0.8,
          outputEfficiency: 0.8,
          inputMaxW: 10,
          outputPorts: [port('usb-a')],
        });
        const lampBank = testBank({
          capacityMah: p.capY,
          chargeEfficiency: 0.6,
          outputEfficiency: 0.7,
          inputMaxW: 10,
          outputPorts: [port('micro-usb')],
        });
        const better = testBank({
          capacityMah: 20000,
          chargeEfficiency: 0.95,
          outputEfficiency: 0.95,
          inputMaxW: p.inW,
          outputPorts: [port('micro-usb')],
        });
        const lamp = testPhone(0.9, {
          deviceKind: 'headlamp',
          ownBatteryWh: 5,
          chargePort: { connector: 'micro-usb', captiveCable: true },
        });
        return {
          nights: p.nights ?? 3,
          devices: [
            { deviceId: 'phone', spec: testPhone(p.share ?? 0) },
            { deviceId: 'lamp', spec: lamp },
          ],
          kit: [
            { itemId: 'phone-bank', count: 1, spec: phoneBank },
            { itemId: 'lamp-bank', count: 1, spec: lampBank },
            { itemId: 'lead', count: 1, spec: testLead('usb-a', 'usb-c') },
            {
              itemId: 'panel',
              count: 1,
              spec: testUsbPanel({ ratedW: p.w, outputPort: { connector: 'usb-c', captiveCable: true } }),
            },
          ],
          added: { itemId: 'better-bank', count: 1, spec: better },
        };
      },
      {
        nights: [3, 6, 10],
        cap: [2000, 3000, 5000, 8000],
        share: [0.8, 1, 1.3, 1.6],
        w: [3, 6, 10, 20],
        inW: [3, 10],
        capY: [3000, 10000],
      },
    );
    expect(feasibleBase).toBeGreaterThan(50);
    expect(broken).toEqual([]);
  }, 60_000);

  it('a less efficient bank added as a spare does not waste the harvest', () => {
    // "Most room first" alone would pour harvest into the lossy spare once it had room.
    const { feasibleBase, broken } = sweep(
      (p) => ({
        nights: p.nights ?? 3,
        devices: [{ deviceId: 'phone', spec: testPhone(p.share ?? 0) }],
        kit: [
          {
            itemId: 'bank',
            count: 1,
            spec: testBank({ capacityMah: p.cap, chargeEfficiency: 0.95, outputEfficiency: 0.95 }),
          },
          { itemId: 'lead', count: 1, spec: testLead('usb-a', 'usb-c') },
          {
            itemId: 'panel',
            count: 1,
            spec: testUsbPanel({ ratedW: p.w, outputPort: { connector: 'usb-c', captiveCable: true } }),
          },
        ],
        added: {
          itemId: 'lossy',
          count: 1,
          spec: testBank({ capacityMah: p.capLossy, chargeEfficiency: 0.6, outputEfficiency: 0.6 }),
        },
      }),
      {
        nights: [6, 14, 30],
        cap: [3000, 6000, 10000],
        share: [0.8, 1.2, 1.6, 2],
        w: [4, 6, 8, 12],
        capLossy: [1000, 5000, 20000],
      },
    );
    expect(feasibleBase).toBeGreaterThan(30);
    expect(broken).toEqual([]);
  }, 60_000);

  it('a lossy bank added beside a better one does not take its harvest once drained (found by a soak)', () => {
    // Frosty camp (−8 … +0.5 °C): harvest only in the few hours above 0 °C, while the phone charges all camp long at
    // 2 W. With harvest levelled by room alone, the phone drained the better banks to their floor, then the lossy spare
    // (0.36 usable Wh per input Wh against 0.74), which then took its share of the scarce warm-hour harvest at half the
    // yield, and the kit ran dry. Harvest now reaches a store only once every store that outranks it (more usable Wh per
    // input Wh, and charges the same devices as fast and as efficiently) is full or at its input limit.
    const bankPort: OutputPort = { ...port('usb-a'), maxA: 0.5 };
    const bank = (capacityMah: number, chargeEfficiency: number, outputEfficiency: number) =>
      testBank({ capacityMah, chargeEfficiency, outputEfficiency, inputMaxW: 3, outputPorts: [bankPort] });
    const { feasibleBase, broken } = sweep(
      (p) => ({
        nights: p.nights ?? 4,
        devices: [
          {
            deviceId: 'phone',
            spec: testPhone(p.share ?? 0, { ownBatteryWh: 7.2, chargePowerW: 2, chargeEfficiency: 0.75 }),
          },
        ],
        kit: [
          { itemId: 'bank', count: p.banks ?? 1, spec: bank(p.cap ?? 0, 0.75, 0.98) },
          { itemId: 'lead', count: 1, spec: testLead('usb-a', 'usb-c') },
          {
            itemId: 'panel',
            count: 1,
            spec: testUsbPanel({
              ratedW: 30,
              portMaxA: p.portA,
              outputPort: { connector: 'usb-c', captiveCable: true },
            }),
          },
        ],
        added: { itemId: 'lossy', count: 1, spec: bank(p.capLossy ?? 0, 0.6, 0.6) },
      }),
      {
        nights: [4, 6],
        share: [0.85, 0.9, 0.95, 1, 1.05, 1.1, 1.15, 1.2],
        cap: [1000, 1240],
        banks: [1, 2],
        capLossy: [1500, 2030, 3000],
        portA: [0.5, 1],
        walkStart: [4],
        walkEnd: [8],
        lowC: [-8],
        highC: [0.5],
      },
    );
    expect(feasibleBase).toBeGreaterThan(100);
    expect(broken).toEqual([]);
  }, 60_000);

  it('a more efficient but slower boost converter does not slow the radio’s charging', () => {
    // A single "most efficient path" would switch to the slow converter; the paths' hull keeps the fast one in use.
    const { feasibleBase, broken } = sweep(
      (p) => {
        const radio = testRadio({
          chargeCurrentA: 2,
          ownBatteryWh: p.battery ?? 0,
          useProfile: {
            basis: 'radio-hours',
            transmitMinutesPerDay: p.tx ?? 0,
            receiveHoursPerDay: 3,
            standbyHoursPerDay: 8,
          },
        });
        return {
          nights: 4,
          devices: [{ deviceId: 'radio', spec: radio }],
          kit: [
            { itemId: 'bank', count: 4, spec: testBank({ capacityMah: 20000, outputPorts: [port('usb-a')] }) },
            { itemId: 'fast-boost', count: 1, spec: testBoostConverter({ maxOutputA: 2, efficiency: 0.8 }) },
          ],
          added: {
            itemId: 'slow-boost',
            count: 1,
            spec: testBoostConverter({ maxOutputA: p.slowA, efficiency: 0.95 }),
          },
        };
      },
      { battery: [8, 12, 20], tx: [10, 30, 60], slowA: [0.1, 0.3, 0.6], walkStart: [5, 7], walkEnd: [19, 21, 23] },
    );
    expect(feasibleBase).toBeGreaterThan(10);
    expect(broken).toEqual([]);
  }, 60_000);
  it('a more efficient bank behind a slightly weaker port does not slow the radio (found by a soak)', () => {
    // With the device's hour shared between stores, the added bank (first in merit order) held the radio to its port's
    // 0.5 A where the old banks gave 0.50025 A, and a kit that just lasted ran dry. No sun, 1 night, −10 °C.
    const lead = testLead('usb-a', 'usb-c');
    const boost = testBoostConverter({
      inputVolts: 5,
      outputVolts: 12.5,
      maxOutputA: 0.2,
      efficiency: 0.7,
      inputPort: { connector: 'usb-c', captiveCable: false },
      outputPort: { connector: 'barrel-5.5x2.1', captiveCable: false },
    });
    const oldBank = testBank({
      capacityMah: 6837,
      chargeEfficiency: 0.6,
      outputEfficiency: 0.93888,
      inputMaxW: 3,
      outputPorts: [{ ...port('usb-a'), maxA: 0.50025 }],
    });
    const newBank = testBank({
      capacityMah: 12195,
      chargeEfficiency: 0.6,
      outputEfficiency: 0.99992,
      inputMaxW: 3,
      outputPorts: [{ ...port('usb-a'), maxA: 0.5 }],
    });
    const solar = syntheticTripSolar({
      nights: 1,
      peakWm2: 0,
      lowC: -10,
      highC: -10,
      walkStartHour: 5,
      walkEndHour: 10,
    });
    const kit: KitEntry[] = [
      { itemId: 'boost', count: 1, spec: boost },
      { itemId: 'old-bank', count: 2, spec: oldBank },
      { itemId: 'lead', count: 1, spec: lead },
    ];
    const bigger: KitEntry[] = [{ itemId: 'new-bank', count: 1, spec: newBank }, ...kit];
    const devicesWith = (batteryWh: number) => [
      {
        deviceId: 'radio',
        spec: testRadio({
          ownBatteryWh: batteryWh,
          chargeCurrentA: 0.2,
          transmitCurrentA: 0.8,
          receiveCurrentA: 0.35976,
          standbyCurrentA: 0.040834,
          chargePort: { connector: 'barrel-5.5x2.1', captiveCable: true },
          useProfile: {
            basis: 'radio-hours',
            transmitMinutesPerDay: 54.066,
            receiveHoursPerDay: 3.4272,
            standbyHoursPerDay: 8.982,
          },
        }),
      },
    ];
    // The smallest radio battery with which the old kit lasts (bisection), then batteries just above it.
    let lo = 1;
    let hi = 30;
    for (let i = 0; i < 50; i++) {
      const mid = (lo + hi) / 2;
      if (isKitFeasible({ solar, kit, devices: devicesWith(mid), reserveShare: 0 })) hi = mid;
      else lo = mid;
    }
    let feasibleBase = 0;
    const broken: number[] = [];
    for (const aboveWh of [1e-6, 1e-4, 1e-3, 3e-3, 1e-2, 3e-2, 0.1]) {
      const devices = devicesWith(hi + aboveWh);
      if (!isKitFeasible({ solar, kit, devices, reserveShare: 0 })) continue;
      feasibleBase++;
      if (!isKitFeasible({ solar, kit: bigger, devices, reserveShare: 0 })) broken.push(aboveWh);
    }
    expect(feasibleBase).toBe(7);
    expect(broken).toEqual([]);
  });
  it('an equally fast but less efficient converter is never preferred (found by a soak)', () => {
    // Both converters give the radio the same 2.5 W here (2 A bank ports, 0.2 A converter outputs); a hull that kept
    // the later of two equal-rate paths used the lossier one and wasted the bank's last watt-hours on a trip the
    // efficient one just covered. No sun, 1 night, −10 °C; the bank offers 12 V USB PD on one port.
    const bank = testBank({
      capacityMah: 12634,
      chargeEfficiency: 0.6,
      outputEfficiency: 0.73332,
      inputMaxW: 3,
      outputPorts: [
        { ...port('usb-a'), captiveCable: true },
        { ...port('usb-a'), usbPdVolts: [12] },
      ],
    });
    const efficient = testBoostConverter({
      inputVolts: 5,
      outputVolts: 12.5,
      maxOutputA: 0.2,
      efficiency: 0.70005,
      inputPort: { connector: 'usb-a', captiveCable: false },
      outputPort: { connector: 'barrel-5.5x2.1', captiveCable: false },
    });
    const faster = testBoostConverter({
      inputVolts: 12,
      outputVolts: 12.5,
      maxOutputA: 0.2,
      efficiency: 0.7,
      inputPort: { connector: 'usb-a', captiveCable: true },
      outputPort: { connector: 'barrel-5.5x2.1', captiveCable: false },
    });
    const solar = syntheticTripSolar({
      nights: 1,
      peakWm2: 0,
      lowC: -10,
      highC: -10,
      walkStartHour: 5,
      walkEndHour: 10,
    });
    const kit: KitEntry[] = [
      { itemId: 'efficient', count: 1, spec: efficient },
      { itemId: 'bank', count: 1, spec: bank },
      { itemId: 'lead', count: 1, spec: testLead('usb-a', 'usb-c') },
    ];
    const bigger: KitEntry[] = [{ itemId: 'faster', count: 1, spec: faster }, ...kit];
    const devicesWith = (batteryWh: number) => [
      {
        deviceId: 'radio',
        spec: testRadio({
          ownBatteryWh: batteryWh,
          chargeCurrentA: 0.2,
          chargeEfficiency: 0.722125,
          transmitCurrentA: 0.94028,
          receiveCurrentA: 0.3702,
          standbyCurrentA: 0.039097,
          chargePort: { connector: 'barrel-5.5x2.1', captiveCable: true },
          useProfile: {
            basis: 'radio-hours',
            transmitMinutesPerDay: 48.414,
            receiveHoursPerDay: 1.2328,
            standbyHoursPerDay: 11.0604,
          },
        }),
      },
    ];
    const reserveShare = 0.04197;
    let lo = 1;
    let hi = 30;
    for (let i = 0; i < 50; i++) {
      const mid = (lo + hi) / 2;
      if (isKitFeasible({ solar, kit, devices: devicesWith(mid), reserveShare })) hi = mid;
      else lo = mid;
    }
    let feasibleBase = 0;
    const broken: number[] = [];
    for (const aboveWh of [1e-6, 1e-4, 1e-3, 1e-2, 0.1, 0.5, 1, 2, 2.94, 4]) {
      const devices = devicesWith(hi + aboveWh);
      if (!isKitFeasible({ solar, kit, devices, reserveShare })) continue;
      feasibleBase++;
      if (!isKitFeasible({ solar, kit: bigger, devices, reserveShare })) broken.push(aboveWh);
    }
    expect(feasibleBase).toBe(10);
    expect(broken).toEqual([]);
  });
  it('a faster, lossier boost converter does not waste a just-big-enough bank on the radio', () => {
    // No sun. The radio charges from one bank through a slow 0.95-efficient boost, too slow to fill it in one camp but
    // enough, with the bank just big enough, to last the trip. Paced to be full by the end of each camp, the added fast
    // 0.7-efficient boost carried the extra charge at its loss and the bank ran dry before the end (115 of these 425
    // kits). The pace now goes past the most efficient path only as far as the radio needs to reach the trip's end.
    const fast: KitEntry = {
      itemId: 'fast-boost',
      count: 1,
      spec: testBoostConverter({ maxOutputA: 1, efficiency: 0.7 }),
    };
    let feasibleBase = 0;
    const broken: Record<string, number>[] = [];
    for (const nights of [2, 3, 5])
      for (const [walkStartHour, walkEndHour] of [
        [8, 16],
        [6, 20],
      ] as const) {
        const solar = syntheticTripSolar({ nights, peakWm2: 0, walkStartHour, walkEndHour });
        for (const batteryWh of [15, 30])
          for (const energyWhPerDay of [6, 10, 14])
            for (const slowA of [0.03, 0.06, 0.1]) {
              const devices: TripDevice[] = [
                {
                  deviceId: 'radio',
                  spec: testRadio({
                    ownBatteryWh: batteryWh,
                    chargeCurrentA: 2,
                    useProfile: { basis: 'energy', energyWhPerDay },
                  }),
                },
              ];
              const slow: KitEntry = {
                itemId: 'slow-boost',
                count: 1,
                spec: testBoostConverter({ maxOutputA: slowA, efficiency: 0.95 }),
              };
              const kitWith = (capacityMah: number): KitEntry[] => [
                slow,
                { itemId: 'bank', count: 1, spec: testBank({ capacityMah }) },
              ];
              const feasible = (kit: KitEntry[]) => isKitFeasible({ solar, kit, devices, reserveShare: 0 });
              // The smallest bank with which the kit without the fast boost lasts (bisection), then banks just above it.
              let lo = 100;
              let hi = 60_000;
              if (!feasible(kitWith(hi))) continue;
              for (let i = 0; i < 40; i++) {
                const mid = (lo + hi) / 2;
                if (feasible(kitWith(mid))) hi = mid;
                else lo = mid;
              }
              for (const aboveMah of [0.01, 1, 10, 100, 300]) {
                const kit = kitWith(hi + aboveMah);
                if (!feasible(kit)) continue;
                feasibleBase++;
                if (!feasible([...kit, fast]))
                  broken.push({ nights, walkStartHour, batteryWh, energyWhPerDay, slowA, aboveMah });
              }
            }
      }
    expect(feasibleBase).toBe(425);
    expect(broken).toEqual([]);
  }, 60_000);
});

describe('more demand never raises a store’s energy: hand-built cases', () => {
  it('a phone on its own bank and on a bank it shares with a headlamp (found by a soak)', () => {
    // Filled to full from its own bank but only to its use left from the shared one, the phone with more demand was
    // filled further from the shared bank, was then full when the sun refilled its own bank, and left that harvest in
    // it — its own bank held up to 0.75 Wh more than with less demand. A device that reaches a shared store is now
    // filled only to its use left from every store.
    const bankPort = (connector: OutputPort['connector']): OutputPort => ({ ...port(connector), maxA: 0.5 });
    const lamp = testPhone(0.1, {
      deviceKind: 'headlamp',
      ownBatteryWh: 1,
      chargePort: { connector: 'micro-usb', captiveCable: false },
    });
    let cases = 0;
    const broken: Record<string, number>[] = [];
    for (const nights of [2, 3])
      for (const share of [0.5, 0.6, 0.7])
        for (const factor of [1.5, 2])
          for (const ratedW of [2, 4, 8])
            for (const ownMah of [500, 1000]) {
              const solar = syntheticTripSolar({ nights, cloudyShare: 0.3 });
              const kit: KitEntry[] = [
                {
                  itemId: 'own-bank',
                  count: 1,
                  spec: testBank({ capacityMah: ownMah, inputMaxW: 3, outputPorts: [bankPort('usb-c')] }),
                },
                {
                  itemId: 'shared-bank',
                  count: 1,
                  spec: testBank({
                    capacityMah: 2000,
                    inputMaxW: 3,
                    inputPort: { connector: 'micro-usb', captiveCable: false },
                    outputPorts: [bankPort('usb-a')],
                  }),
                },
                { itemId: 'lead-c', count: 1, spec: testLead('usb-c', 'usb-c') },
                { itemId: 'lead-a', count: 1, spec: testLead('usb-a', 'usb-c') },
                { itemId: 'lead-m', count: 1, spec: testLead('usb-a', 'micro-usb') },
                {
                  itemId: 'panel',
                  count: 1,
                  spec: testUsbPanel({ ratedW, outputPort: { connector: 'usb-c', captiveCable: true } }),
                },
              ];
              const run = (demandFactor: number) =>
                simulateKit({
                  solar,
                  kit,
                  devices: [
                    {
                      deviceId: 'phone',
                      spec: testPhone(share * demandFactor, {
                        ownBatteryWh: 3,
                        chargePowerW: 2,
                        chargeEfficiency: 0.7,
                      }),
                    },
                    { deviceId: 'lamp', spec: lamp },
                  ],
                  reserveShare: 0.2,
                });
              const base = run(1);
              const hungrier = run(factor);
              const units = base.stores.length + base.devices.length;
              let worstRiseWh = 0;
              base.skies.forEach((sky, k) => {
                const more = hungrier.skies[k]?.unitWhByStep ?? new Float64Array();
                sky.unitWhByStep.forEach((wh, i) => {
                  if (i % units < base.stores.length) worstRiseWh = Math.max(worstRiseWh, (more[i] ?? Infinity) - wh);
                });
              });
              cases++;
              if (worstRiseWh >= 1e-9) broken.push({ nights, share, factor, ratedW, ownMah, worstRiseWh });
            }
    expect(cases).toBe(72);
    expect(broken).toEqual([]);
  }, 60_000);

  it('a phone on a bank with a slow and a fast port, then a second bank (found by a soak)', () => {
    // No sun. The phone reaches the first bank (first in merit order) through a slow port and, over the lead, a fast
    // one, and a second bank through one port; its charge power is less than the two banks give together. Paced store
    // by store in merit order — faster than the slow port only as far as the phone needs to reach the trip's end — the
    // hungrier phone took the first bank faster, that used more of its charge power in the step, the second bank gave
    // less and held up to 0.30 Wh more than with less demand (soak seed 2, run 16,444; 18 of these 270 kits). Every
    // store now first gives its most efficient rate, and only then do the stores speed up, within the power left.
    const solar = syntheticTripSolar({ nights: 3, peakWm2: 0, walkStartHour: 9, walkEndHour: 18 });
    let cases = 0;
    const broken: Record<string, number>[] = [];
    for (const chargeEfficiency of [0.7, 0.75, 0.78, 0.8, 0.85])
      for (const slowA of [0.5, 0.7, 0.9])
        for (const fastA of [2, 2.4])
          for (const share of [1, 1.2, 1.45])
            for (const factor of [1.5, 2.4, 3]) {
              const kit: KitEntry[] = [
                { itemId: 'lead', count: 1, spec: testLead('usb-c', 'usb-c') },
                {
                  itemId: 'two-port-bank',
                  count: 1,
                  spec: testBank({
                    capacityMah: 5600,
                    chargeEfficiency: 0.74,
                    outputEfficiency: 0.93,
                    outputPorts: [
                      { ...port('usb-c'), maxA: fastA },
                      { ...port('usb-c'), captiveCable: true, maxA: slowA },
                    ],
                  }),
                },
                {
                  itemId: 'second-bank',
                  count: 1,
                  spec: testBank({
                    capacityMah: 22000,
                    chargeEfficiency: 0.8,
                    outputEfficiency: 0.61,
                    outputPorts: [{ ...port('usb-c'), captiveCable: true, maxA: 2.3 }],
                  }),
                },
              ];
              const run = (batterySharePerDay: number) =>
                simulateKit({
                  solar,
                  kit,
                  devices: [
                    {
                      deviceId: 'phone',
                      spec: testPhone(batterySharePerDay, {
                        ownBatteryWh: 20,
                        chargePowerW: 12,
                        chargeEfficiency,
                        chargePort: { connector: 'usb-c', captiveCable: true },
                      }),
                    },
                  ],
                  reserveShare: 0.1,
                });
              const base = run(share);
              const hungrier = run(share * factor);
              const units = base.stores.length + base.devices.length;
              let worstRiseWh = 0;
              base.skies.forEach((sky, k) => {
                const more = hungrier.skies[k]?.unitWhByStep ?? new Float64Array();
                sky.unitWhByStep.forEach((wh, i) => {
                  if (i % units < base.stores.length) worstRiseWh = Math.max(worstRiseWh, (more[i] ?? Infinity) - wh);
                });
              });
              cases++;
              if (worstRiseWh >= 1e-9) broken.push({ chargeEfficiency, slowA, fastA, share, factor, worstRiseWh });
            }
    expect(cases).toBe(270);
    expect(broken).toEqual([]);
  }, 60_000);
});

// More sun and more demand against the harvest rule. Harvest used to reach a store only once every store that outranks
// it was full or at its input limit; "outranks" is not transitive with levelling, so one store filling (more sun) or being
// drawn below full (more demand) moved an hour's harvest between two others. Harvest now goes tier by tier (a store's
// tier: its depth under the stores that outrank it, fixed by the kit), each tier levelled by room.

/** Largest fall of any unit (more sun) or rise of any store (more demand) between two runs at any step, Wh. */
function worstBreachWh(base: KitSimulation, other: KitSimulation, more: 'sun' | 'demand'): number {
  const stores = base.stores.length;
  const units = stores + base.devices.length;
  let worstWh = 0;
  base.skies.forEach((sky, k) => {
    const next = other.skies[k]?.unitWhByStep ?? new Float64Array();
    sky.unitWhByStep.forEach((wh, i) => {
      if (more === 'sun') worstWh = Math.max(worstWh, wh - (next[i] ?? -Infinity));
      else if (i % units < stores) worstWh = Math.max(worstWh, (next[i] ?? Infinity) - wh);
    });
  });
  return worstWh;
}

/** The same devices with each day's battery share scaled by `factor`. */
function hungrier(devices: TripDevice[], factor: number): TripDevice[] {
  return devices.map((d) => {
    const use = d.spec.useProfile;
    if (use.basis !== 'battery-share') throw new Error('battery-share devices only');
    return { ...d, spec: { ...d.spec, useProfile: { ...use, batterySharePerDay: use.batterySharePerDay * factor } } };
  });
}

describe('more sun and more demand never move harvest between two other stores: hand-built cases', () => {
  // A PD phone and three banks behind one port-limited panel: bank A keeps the most per input Wh but has no PD; banks B
  // and C give PD, B keeps a little more than C, so B outranks C and A outranks neither (C charges the phone faster).
  // Under the old rule, with more sun B filled an hour sooner, C was no longer held back and levelling sent the hour's
  // harvest to C (more room) instead of A, which ended lower (soak seed 6, run 39,615: 0.88 Wh); with more demand the
  // phone drew B below full, C was held back again and A took the hour's harvest, ending higher.
  const pdPort = (usbPdVolts: number[]): OutputPort => ({ ...port('usb-a'), maxA: 0.5, usbPdVolts });
  const bank = (itemId: string, chargeEfficiency: number, outputEfficiency: number, pd: number[]): KitEntry => ({
    itemId,
    count: 1,
    spec: testBank({ capacityMah: 1000, chargeEfficiency, outputEfficiency, inputMaxW: 3, outputPorts: [pdPort(pd)] }),
  });
  const kit: KitEntry[] = [
    {
      itemId: 'panel',
      count: 1,
      spec: testUsbPanel({
        ratedW: 30,
        portMaxA: 0.5,
        dropoutIrradianceWm2: 0,
        tempCoeffPctPerC: -0.5,
        outputPort: { connector: 'usb-c', captiveCable: false },
      }),
    },
    bank('bank-a', 0.7, 0.92, []),
    bank('bank-b', 0.607, 0.6, [9]),
    bank('bank-c', 0.6, 0.6, [9]),
    { itemId: 'lead-c', count: 1, spec: testLead('usb-c', 'usb-c') },
    { itemId: 'lead-m', count: 1, spec: testLead('usb-a', 'micro-usb') },
  ];
  const phone = (share: number): TripDevice[] => [
    {
      deviceId: 'phone',
      spec: testPhone(share, {
        ownBatteryWh: 5.4,
        chargesVia: 'usb-pd',
        chargePowerW: 2.6,
        chargeEfficiency: 0.9,
        chargePort: { connector: 'micro-usb', captiveCable: false },
      }),
    },
  ];
  const trip = (peakWm2: number) =>
    syntheticTripSolar({ nights: 3, cloudyShare: 0, peakWm2, lowC: -4, highC: 5, walkStartHour: 7, walkEndHour: 11 });

  it('more sun never leaves the better bank lower once the outranking bank fills sooner (found by a soak)', () => {
    // The tiered rule: 0 of these 75 kits break; the rule before broke 38 (up to 0.84 Wh).
    let cases = 0;
    const broken: Record<string, number>[] = [];
    for (const peakWm2 of [70, 80, 90, 100, 110])
      for (const share of [0.5, 0.55, 0.6, 0.65, 0.7])
        for (const factor of [1.1, 1.3, 1.6]) {
          const solar = trip(peakWm2);
          const base = simulateKit({ solar, kit, devices: phone(share), reserveShare: 0.15 });
          const sunnier = simulateKit({
            solar: scaleSolar(solar, factor),
            kit,
            devices: phone(share),
            reserveShare: 0.15,
          });
          const worstWh = worstBreachWh(base, sunnier, 'sun');
          cases++;
          if (worstWh >= 1e-9) broken.push({ peakWm2, share, factor, worstWh });
        }
    expect(cases).toBe(75);
    expect(broken).toEqual([]);
  }, 60_000);

  it('more demand never leaves the better bank higher once the outranking bank is drawn below full', () => {
    // The tiered rule: 0 of these 196 kits break; the rule before broke 37 (up to 0.91 Wh, the hungrier kit keeping up).
    let cases = 0;
    const broken: Record<string, number>[] = [];
    for (const peakWm2 of [70, 80, 90, 100, 110, 150, 200])
      for (const share of [0.3, 0.4, 0.5, 0.55, 0.6, 0.65, 0.7])
        for (const factor of [1.05, 1.1, 1.3, 1.6]) {
          const solar = trip(peakWm2);
          const base = simulateKit({ solar, kit, devices: phone(share), reserveShare: 0.15 });
          const more = simulateKit({ solar, kit, devices: phone(share * factor), reserveShare: 0.15 });
          const worstWh = worstBreachWh(base, more, 'demand');
          cases++;
          if (worstWh >= 1e-9) broken.push({ peakWm2, share, factor, worstWh });
        }
    expect(cases).toBe(196);
    expect(broken).toEqual([]);
  }, 60_000);

  it('the soak’s shrunk counterexamples hold', () => {
    // fast-check's shrunk forms of the four soak failures of the rule before (50,000 runs a seed): each has a store
    // that outranks a second one and a third store that neither outranks, and the breach is tiny once shrunk (the
    // rule before: 4e-5, 6e-5 and 5e-4 Wh lower with more sun, 8e-6 Wh higher with more demand), yet above 1e-9 Wh.
    const found: {
      found: string;
      more: 'sun' | 'demand';
      factor: number;
      reserveShare: number;
      trip: SyntheticSolarOptions;
      kit: KitEntry[];
      devices: TripDevice[];
    }[] = [
      {
        found: 'sun, seed 3',
        more: 'sun',
        factor: 1.8448,
        reserveShare: 0.29976,
        trip: {
          nights: 2,
          peakWm2: 104.94,
          lowC: -10,
          highC: 2.432,
          cloudyShare: 0,
          expectedShare: 0.92622,
          cloudyRunDays: 1,
          walkStartHour: 8,
          walkEndHour: 12,
        },
        kit: [
          {
            itemId: 'item-0',
            count: 1,
            spec: testBank({
              capacityMah: 1000,
              inputMaxW: 3.756,
              inputPort: { connector: 'usb-c', captiveCable: true },
              outputPorts: [{ connector: 'usb-c', captiveCable: false, volts: 5, maxA: 0.5, usbPdVolts: [] }],
              outputEfficiency: 0.6,
              chargeEfficiency: 0.68992,
            }),
          },
          {
            itemId: 'item-1',
            count: 2,
            spec: testUsbPanel({
              ratedW: 23.2306,
              portMaxA: 0.67575,
              dropoutIrradianceWm2: 0,
              tempCoeffPctPerC: -0.5,
              outputPort: { connector: 'usb-c', captiveCable: false },
            }),
          },
          {
            itemId: 'item-2',
            count: 2,
            spec: testBank({
              capacityMah: 1000,
              inputMaxW: 3,
              inputPort: { connector: 'usb-c', captiveCable: true },
              outputPorts: [{ connector: 'usb-c', captiveCable: false, volts: 5, maxA: 0.5, usbPdVolts: [] }],
              outputEfficiency: 0.6,
              chargeEfficiency: 0.6,
            }),
          },
          {
            itemId: 'item-3',
            count: 1,
            spec: testBank({
              capacityMah: 1000,
              inputMaxW: 3,
              inputPort: { connector: 'usb-c', captiveCable: true },
              outputPorts: [{ connector: 'usb-c', captiveCable: true, volts: 5, maxA: 0.5, usbPdVolts: [] }],
              outputEfficiency: 0.6,
              chargeEfficiency: 0.6,
            }),
          },
        ],
        devices: [
          {
            deviceId: 'device-0',
            spec: testPhone(0.5034, { ownBatteryWh: 1.912, chargePowerW: 2, chargeEfficiency: 0.7 }),
          },
          {
            deviceId: 'device-1',
            spec: testPhone(1.4367, {
              ownBatteryWh: 2.0584,
              chargePowerW: 2,
              chargeEfficiency: 0.7,
              chargePort: { connector: 'usb-c', captiveCable: true },
            }),
          },
        ],
      },
      {
        found: 'sun, seed 5',
        more: 'sun',
        factor: 2.9974,
        reserveShare: 0.168,
        trip: {
          nights: 3,
          peakWm2: 7.26,
          lowC: -10,
          highC: 1.154,
          cloudyShare: 0,
          expectedShare: 0.77166,
          cloudyRunDays: 1,
          walkStartHour: 5,
          walkEndHour: 9,
        },
        kit: [
          {
            itemId: 'item-0',
            count: 2,
            spec: testBank({
              capacityMah: 1681,
              inputMaxW: 3,
              outputPorts: [{ connector: 'usb-a', captiveCable: false, volts: 5, maxA: 0.5, usbPdVolts: [] }],
              outputEfficiency: 0.81432,
              chargeEfficiency: 0.64888,
            }),
          },
          {
            itemId: 'item-1',
            count: 1,
            spec: testBank({
              capacityMah: 2274,
              inputMaxW: 3,
              outputPorts: [{ connector: 'usb-c', captiveCable: false, volts: 5, maxA: 0.50025, usbPdVolts: [] }],
              outputEfficiency: 0.63304,
              chargeEfficiency: 0.6,
            }),
          },
          {
            itemId: 'item-2',
            count: 2,
            spec: testUsbPanel({ ratedW: 35.782, portMaxA: 0.5, dropoutIrradianceWm2: 0, tempCoeffPctPerC: -0.5 }),
          },
          {
            itemId: 'item-3',
            count: 1,
            spec: testBank({
              capacityMah: 1000,
              inputMaxW: 3,
              inputPort: { connector: 'micro-usb', captiveCable: false },
              outputPorts: [{ connector: 'usb-a', captiveCable: false, volts: 5, maxA: 0.50025, usbPdVolts: [] }],
              outputEfficiency: 0.63308,
              chargeEfficiency: 0.6,
            }),
          },
          { itemId: 'common-lead-0', count: 1, spec: testLead('usb-a', 'usb-c') },
          { itemId: 'common-lead-1', count: 1, spec: testLead('usb-c', 'usb-c') },
          { itemId: 'common-lead-2', count: 1, spec: testLead('usb-a', 'micro-usb') },
        ],
        devices: [
          {
            deviceId: 'device-0',
            spec: testPhone(1.3455, {
              ownBatteryWh: 2.1208,
              chargePowerW: 2.5004,
              chargeEfficiency: 0.84185,
              chargePort: { connector: 'usb-a', captiveCable: true },
            }),
          },
          {
            deviceId: 'device-1',
            spec: testPhone(0.51795, {
              ownBatteryWh: 12.46,
              chargePowerW: 2,
              chargeEfficiency: 0.762725,
              chargePort: { connector: 'micro-usb', captiveCable: false },
            }),
          },
        ],
      },
      {
        found: 'sun, seed 6',
        more: 'sun',
        factor: 1.1026,
        reserveShare: 0.14142,
        trip: {
          nights: 3,
          peakWm2: 61.93,
          lowC: -3.955,
          highC: 5.143,
          cloudyShare: 0,
          expectedShare: 0.97347,
          cloudyRunDays: 1,
          walkStartHour: 7,
          walkEndHour: 11,
        },
        kit: [
          {
            itemId: 'item-0',
            count: 1,
            spec: testUsbPanel({
              ratedW: 30.6406,
              portMaxA: 0.5,
              dropoutIrradianceWm2: 0,
              tempCoeffPctPerC: -0.5,
              outputPort: { connector: 'usb-c', captiveCable: false },
            }),
          },
          {
            itemId: 'item-1',
            count: 1,
            spec: testBank({
              capacityMah: 1000,
              inputMaxW: 3,
              outputPorts: [{ connector: 'usb-a', captiveCable: false, volts: 5, maxA: 0.5, usbPdVolts: [] }],
              outputEfficiency: 0.92256,
              chargeEfficiency: 0.70268,
            }),
          },
          {
            itemId: 'item-2',
            count: 1,
            spec: testBank({
              capacityMah: 1000,
              inputMaxW: 3,
              outputPorts: [{ connector: 'usb-a', captiveCable: false, volts: 5, maxA: 0.5, usbPdVolts: [9] }],
              outputEfficiency: 0.6,
              chargeEfficiency: 0.6,
            }),
          },
          {
            itemId: 'item-3',
            count: 1,
            spec: testBank({
              capacityMah: 1000,
              inputMaxW: 3,
              inputPort: { connector: 'usb-a', captiveCable: false },
              outputPorts: [{ connector: 'usb-a', captiveCable: false, volts: 5, maxA: 0.5, usbPdVolts: [9] }],
              outputEfficiency: 0.6,
              chargeEfficiency: 0.60728,
            }),
          },
          { itemId: 'common-lead-0', count: 1, spec: testLead('usb-a', 'usb-c') },
          { itemId: 'common-lead-1', count: 1, spec: testLead('usb-c', 'usb-c') },
          { itemId: 'common-lead-2', count: 1, spec: testLead('usb-a', 'micro-usb') },
        ],
        devices: [
          {
            deviceId: 'device-0',
            spec: testPhone(0.57465, {
              ownBatteryWh: 5.3848,
              chargesVia: 'usb-pd',
              chargePowerW: 2.5004,
              chargeEfficiency: 0.91295,
              chargePort: { connector: 'micro-usb', captiveCable: false },
            }),
          },
        ],
      },
      {
        found: 'demand, seed 5',
        more: 'demand',
        factor: 1.0002,
        reserveShare: 0.11982,
        trip: {
          nights: 1,
          peakWm2: 0.11,
          lowC: -10,
          highC: 0.396,
          cloudyShare: 0,
          expectedShare: 0.3,
          cloudyRunDays: 1,
          walkStartHour: 5,
          walkEndHour: 13,
        },
        kit: [
          {
            itemId: 'item-0',
            count: 1,
            spec: testBank({
              capacityMah: 1000,
              inputMaxW: 3,
              outputPorts: [{ connector: 'usb-a', captiveCable: false, volts: 5, maxA: 0.5, usbPdVolts: [] }],
              outputEfficiency: 0.6,
              chargeEfficiency: 0.60008,
            }),
          },
          {
            itemId: 'item-1',
            count: 1,
            spec: testBank({
              capacityMah: 1000,
              inputMaxW: 3,
              outputPorts: [{ connector: 'usb-c', captiveCable: false, volts: 5, maxA: 0.50025, usbPdVolts: [] }],
              outputEfficiency: 0.6,
              chargeEfficiency: 0.60008,
            }),
          },
          {
            itemId: 'item-2',
            count: 1,
            spec: testBank({
              capacityMah: 1000,
              inputMaxW: 3,
              inputPort: { connector: 'usb-a', captiveCable: false },
              outputPorts: [{ connector: 'usb-a', captiveCable: false, volts: 5, maxA: 0.5, usbPdVolts: [9] }],
              outputEfficiency: 0.60004,
              chargeEfficiency: 0.6,
            }),
          },
          {
            itemId: 'item-3',
            count: 1,
            spec: testUsbPanel({
              ratedW: 2,
              portMaxA: 0.5,
              dropoutIrradianceWm2: 0,
              tempCoeffPctPerC: -0.5,
              outputPort: { connector: 'usb-c', captiveCable: false },
            }),
          },
          { itemId: 'common-lead-0', count: 1, spec: testLead('usb-a', 'usb-c') },
          { itemId: 'common-lead-1', count: 1, spec: testLead('usb-c', 'usb-c') },
          { itemId: 'common-lead-2', count: 1, spec: testLead('usb-a', 'micro-usb') },
        ],
        devices: [
          {
            deviceId: 'device-0',
            spec: testPhone(0, {
              ownBatteryWh: 1,
              chargePowerW: 2,
              chargeEfficiency: 0.7,
              chargePort: { connector: 'usb-a', captiveCable: false },
            }),
          },
          {
            deviceId: 'device-1',
            spec: testPhone(1.10685, {
              ownBatteryWh: 5.7496,
              chargesVia: 'usb-pd',
              chargePowerW: 2.5004,
              chargeEfficiency: 0.7,
            }),
          },
        ],
      },
    ];
    const breaches = found.map((c) => {
      const solar = syntheticTripSolar(c.trip);
      const base = simulateKit({ solar, kit: c.kit, devices: c.devices, reserveShare: c.reserveShare });
      const other = simulateKit({
        solar: c.more === 'sun' ? scaleSolar(solar, c.factor) : solar,
        kit: c.kit,
        devices: c.more === 'sun' ? c.devices : hungrier(c.devices, c.factor),
        reserveShare: c.reserveShare,
      });
      return { found: c.found, worstWh: worstBreachWh(base, other, c.more) };
    });
    expect(breaches.filter((b) => b.worstWh >= 1e-9)).toEqual([]);
  });
});

describe('two devices on two units of one bank: hand-built cases', () => {
  // A camera and a headlamp share two units of one bank whose single port is slower than either device charges (the
  // soak's seed 7 shape, README known gap (8)). Drawn unit by unit, the device topped up first in a round took the first
  // unit; how full the devices arrived decided which of them was left with only the second unit's capped path, so with
  // more sun (fuller devices) they drew the second unit lower. The units of one item are now drawn together.
  const slowPort: OutputPort = { ...port('usb-c'), maxA: 1.5, usbPdVolts: [] };
  const kit = (panelW: number): KitEntry[] => [
    {
      itemId: 'bank',
      count: 2,
      spec: testBank({ capacityMah: 4400, chargeEfficiency: 0.95, outputEfficiency: 0.85, outputPorts: [slowPort] }),
    },
    ...(panelW > 0
      ? [
          {
            itemId: 'panel',
            count: 1,
            spec: testUsbPanel({ ratedW: panelW, outputPort: { connector: 'usb-c', captiveCable: false } }),
          },
          { itemId: 'lead', count: 1, spec: testLead('usb-c', 'usb-c') },
        ]
      : []),
  ];
  const devices = (cameraShare: number, lampShare: number): TripDevice[] => [
    {
      deviceId: 'camera',
      spec: testPhone(cameraShare, { deviceKind: 'camera', ownBatteryWh: 21, chargePowerW: 10, chargeEfficiency: 0.7 }),
    },
    {
      deviceId: 'lamp',
      spec: testPhone(lampShare, { deviceKind: 'headlamp', ownBatteryWh: 11, chargePowerW: 15, chargeEfficiency: 0.8 }),
    },
  ];
  const trip = (peakWm2: number) =>
    syntheticTripSolar({ nights: 4, cloudyShare: 0.2, peakWm2, lowC: 5, highC: 15, walkStartHour: 9, walkEndHour: 20 });

  it('more sun never leaves a unit lower, more demand never leaves one higher', () => {
    // Drawn together: 0 of these 192 kits break (48 of them last the trip); drawn unit by unit, 35 broke (9 with more
    // sun, 26 with more demand, up to 1.04 Wh).
    let cases = 0;
    const broken: Record<string, number | string>[] = [];
    let dry = 0;
    for (const panelW of [0, 10, 20, 40])
      for (const peakWm2 of [300, 700])
        for (const cameraShare of [0.3, 0.5, 0.7, 0.9])
          for (const lampShare of [0.3, 0.6, 0.9])
            for (const factor of [1.15, 1.4]) {
              const solar = trip(peakWm2);
              const run = (s: typeof solar, d: TripDevice[]) =>
                simulateKit({ solar: s, kit: kit(panelW), devices: d, reserveShare: 0.2 });
              const base = run(solar, devices(cameraShare, lampShare));
              if (base.verdict.status === 'runs-dry') dry++;
              const sunWh = worstBreachWh(base, run(scaleSolar(solar, factor), devices(cameraShare, lampShare)), 'sun');
              const demandWh = worstBreachWh(
                base,
                run(solar, devices(cameraShare * factor, lampShare * factor)),
                'demand',
              );
              cases++;
              if (sunWh >= 1e-9) broken.push({ more: 'sun', panelW, peakWm2, cameraShare, lampShare, factor, sunWh });
              if (demandWh >= 1e-9)
                broken.push({ more: 'demand', panelW, peakWm2, cameraShare, lampShare, factor, demandWh });
            }
    expect(cases).toBe(192);
    expect(cases - dry).toBeGreaterThan(40);
    expect(broken).toEqual([]);
  }, 60_000);
});
