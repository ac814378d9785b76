/**
 * Until the simulation and the solver plan the 12 V path, a locker's battery, charge controller and 12 V panel must
 * not be mistaken for USB gear: the planner gives them no coefficients (the presolve drops them) and the simulation
 * leaves them out of every path (reported unused). Invented gear.
 */
import { describe, expect, it } from 'vitest';
import { presolve } from '../optimisation/presolve.js';
import type { KitItemSpec } from '../schemas/kit.js';
import { batterySpecSchema, controllerSpecSchema, twelveVoltPanelSpecSchema } from '../schemas/station-items.js';
import { tripSolarInputSchema } from '../schemas/trip-solar.js';
import { testBank, testLead, testPhone, testUsbPanel } from '../testing/fixtures.js';
import { planningContext } from './build-problem.js';
import type { PlanningGear, PlanningInput } from './planning-input.js';

/**
 * A 12 V panel whose fixed lead ends in a USB-C plug: the one shape that a planner reading every panel as a USB
 * panel would wrongly join straight to the bank's USB-C input.
 */
const twelveVoltPanel = twelveVoltPanelSpecSchema.parse({
  kind: 'panel',
  panelType: '12v',
  ratedW: 30,
  maxPowerVolts: 18,
  maxPowerAmps: 1.67,
  openCircuitVolts: 21.6,
  outputPort: { connector: 'usb-c', captiveCable: true },
  massG: 900,
});
const battery = batterySpecSchema.parse({
  kind: 'battery',
  chemistry: 'lifepo4',
  cellsInSeries: 4,
  capacityAh: 6,
  port: { connector: 'ring-terminal', captiveCable: false },
  massG: 760,
});
const controller = controllerSpecSchema.parse({
  kind: 'controller',
  controllerType: 'mppt',
  maxInputVolts: 30,
  maxChargeA: 5,
  inputPort: { connector: 'usb-c', captiveCable: false },
  outputPort: { connector: 'ring-terminal', captiveCable: false },
  massG: 110,
});

const gear = (itemId: string, spec: KitItemSpec): PlanningGear => ({
  itemId,
  name: itemId,
  countOwned: 1,
  massG: Math.round(spec.massG),
  spec,
});

/** Five sunny nights at 45° N in July; a phone that uses half its battery a day, a USB panel, a bank and a lead. */
const trip = (withTwelveVolt: boolean): PlanningInput => ({
  solarInput: tripSolarInputSchema.parse({
    latitudeDeg: 45,
    longitudeDeg: 0,
    timeZone: 'Etc/GMT',
    startDate: '2027-07-01',
    nights: 5,
    sky: { clearShare: 0.8, cloudyPersistence: 0.3, cloudyTransmission: 0.3, canopyShade: 0, designLikelihood: 0.9 },
    temperatures: { lowC: 8, highC: 22 },
  }),
  devices: [{ deviceId: 'phone', spec: testPhone(0.5) }],
  gear: [
    gear('usb-panel', testUsbPanel()),
    gear('bank', testBank()),
    gear('lead', testLead('usb-a', 'usb-c')),
    ...(withTwelveVolt
      ? [gear('panel-12v', twelveVoltPanel), gear('battery', battery), gear('controller', controller)]
      : []),
  ],
  reserveShare: 0,
  gramLimitG: null,
});

const twelveVoltIds = ['battery', 'controller', 'panel-12v'];

describe('12 V gear before the 12 V path is planned', () => {
  it('gets no harvest or storage coefficients, so the presolve drops it for having no role', () => {
    const { problem } = planningContext(trip(true));
    expect(problem.candidates.map((c) => c.itemId)).toEqual(expect.arrayContaining(twelveVoltIds));
    expect(problem.coefficients.panels.map((p) => p.itemId)).toEqual(['usb-panel']);
    expect(problem.coefficients.stores.map((s) => s.itemId)).toEqual(['bank']);
    const dropped = presolve(problem).dropped.filter((d) => twelveVoltIds.includes(d.itemId));
    expect(dropped.map((d) => d.itemId).sort()).toEqual(twelveVoltIds);
    expect(dropped.every((d) => d.reason === 'no-role')).toBe(true);
  });

  it('is reported unused in a simulated kit, and leaves the verdict as it was without it', () => {
    const all = new Map([...trip(true).gear].map((g) => [g.itemId, 1]));
    const usbOnly = new Map([...trip(false).gear].map((g) => [g.itemId, 1]));
    const withTwelveVolt = planningContext(trip(true)).simulate(all);
    const without = planningContext(trip(false)).simulate(usbOnly);
    expect([...withTwelveVolt.unusedItemIds].sort()).toEqual(expect.arrayContaining(twelveVoltIds));
    expect(withTwelveVolt.verdict).toEqual(without.verdict);
  });
});
