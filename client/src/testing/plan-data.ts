import {
  checkResultSchema,
  chosenKitSchema,
  planModelVersion,
  planRecordSchema,
  planResultSchema,
  tripSchema,
  type ChargeSessionJson,
  type CheckResult,
  type ChosenKit,
  type KitEvaluation,
  type PlanKit,
  type PlanKitLine,
  type PlanRecord,
  type PlanResult,
  type Trip,
} from '@gramwatt/shared';

/**
 * Invented plan fixtures (not the demo scenario): a six-day trip two hours east of UTC, a panel, two banks, a boost
 * lead for a 12 V radio and two leads. Every builder's answer goes through the shared schema, so a fixture that
 * drifts from the contract fails loudly.
 */

const uuid = (group: string, n: number) => `00000000-0000-4000-${group}-${String(n).padStart(12, '0')}`;

export const planTripId = uuid('a000', 1);
export const planLeaderId = uuid('a000', 2);

/** The invented gear of the fixtures, by role in the kit. */
export const fixtureGear = {
  panel: { itemId: uuid('b000', 1), name: 'Test fold-out panel 12 W', kind: 'panel', unitMassG: 320 },
  bigBank: { itemId: uuid('b000', 2), name: 'Test bank 20 000 mAh', kind: 'bank', unitMassG: 350 },
  smallBank: { itemId: uuid('b000', 3), name: 'Test bank 5 000 mAh', kind: 'bank', unitMassG: 105 },
  boost: { itemId: uuid('b000', 4), name: 'Test boost lead 5 V → 13.8 V', kind: 'converter', unitMassG: 45 },
  dcLead: { itemId: uuid('b000', 5), name: 'Test barrel to radio lead', kind: 'lead', unitMassG: 45 },
  usbLead: { itemId: uuid('b000', 6), name: 'Test USB-C lead', kind: 'lead', unitMassG: 28 },
  spareLead: { itemId: uuid('b000', 7), name: 'Test spare micro-USB lead', kind: 'lead', unitMassG: 14 },
} as const;
export type FixtureGearKey = keyof typeof fixtureGear;

export const fixtureDevices = {
  radio: { deviceId: uuid('8c00', 1), name: 'Test handheld radio' },
  phone: { deviceId: uuid('8c00', 2), name: 'Test phone' },
} as const;

/** Kit lines from gear keys and counts, grams multiplied out. */
export const kitLines = (counts: Partial<Record<FixtureGearKey, number>>): PlanKitLine[] =>
  (Object.entries(counts) as Array<[FixtureGearKey, number]>)
    .filter(([, count]) => count > 0)
    .map(([key, count]) => ({ ...fixtureGear[key], count, massG: fixtureGear[key].unitMassG * count }));

export const buildPlanKit = (lines: PlanKitLine[], gramLimitG: number | null = 1200): PlanKit => {
  const massG = lines.reduce((sum, line) => sum + line.massG, 0);
  return {
    lines,
    massG,
    gramLimitG,
    overLimitG: gramLimitG !== null && massG > gramLimitG ? massG - gramLimitG : null,
  };
};

/** The optimum of the fixtures: 893 g under a 1,200 g limit. */
export const optimumLines = () => kitLines({ panel: 1, bigBank: 1, smallBank: 1, boost: 1, dcLead: 1, usbLead: 1 });

const msPerHour = 3_600_000;
/** 08:30 local on the first day, at UTC+2. */
const tripStartMs = Date.UTC(2027, 2, 10, 6, 30);
const utcOffsetH = 2;
const iso = (ms: number) => new Date(ms).toISOString();
const localTimeAt = (ms: number) => {
  const d = new Date(ms + utcOffsetH * msPerHour);
  return `${String(d.getUTCHours()).padStart(2, '0')}:${String(d.getUTCMinutes()).padStart(2, '0')}`;
};
const dateOf = (dayIndex: number) => iso(tripStartMs + dayIndex * 24 * msPerHour).slice(0, 10);

export interface EvaluationOptions {
  /** Stored energy at each day's end, as a share of all storage; its length is the number of days. */
  storedEndShares?: number[];
  /** First dry day (0-based) in the binding sky, or null. */
  dryFromDayIndex?: number | null;
  lines?: PlanKitLine[];
  verdict?: Partial<KitEvaluation['verdict']>;
  bindingSkyId?: KitEvaluation['bindingSkyId'];
  cautionIds?: string[];
}

const cautionTexts: Record<string, { severity: string; text: string }> = {
  lithium: { severity: 'warning', text: 'Lithium batteries can burn: use protected packs and their own chargers.' },
  'dc-fusing': { severity: 'warning', text: 'Fuse DC leads on the positive side, close to the battery.' },
  'boost-noise': { severity: 'info', text: 'Boost converters can make radio noise: charge while not operating.' },
  licence: { severity: 'info', text: 'Transmitting needs the licence the law of the place requires.' },
  'airline-approval': { severity: 'warning', text: 'This bank is rated 120 Wh: it needs the airline’s approval.' },
  estimates: { severity: 'info', text: 'These figures are estimates, not a guarantee: carry a margin.' },
};

const totalStorageWh = 150;
const demandWhPerDay = 34.3;

/** A kit's simulation on the six-day fixture trip, consistent across the strip, ledger, series and schedule. */
export const buildEvaluation = ({
  storedEndShares = [0.88, 0.87, 0.69, 0.53, 0.37, 0.22],
  dryFromDayIndex = null,
  lines = optimumLines(),
  verdict,
  bindingSkyId = 'cloudy-end',
  cautionIds = ['lithium', 'dc-fusing', 'boost-noise', 'licence', 'estimates'],
}: EvaluationOptions = {}): KitEvaluation => {
  const days = storedEndShares.map((share, dayIndex) => ({ dayIndex, share }));
  const hasPanel = lines.some((line) => line.kind === 'panel');
  const ledgerDays = days.map(({ dayIndex, share }) => {
    const storedStartWh = dayIndex === 0 ? totalStorageWh : (storedEndShares[dayIndex - 1] ?? 0) * totalStorageWh;
    const storedEndWh = share * totalStorageWh;
    const harvestWh = hasPanel ? Math.max(0, storedEndWh - storedStartWh + demandWhPerDay + 8) : 0;
    const dry = dryFromDayIndex !== null && dayIndex >= dryFromDayIndex;
    return {
      dayIndex,
      availableHarvestWh: harvestWh * 1.6,
      harvestWh,
      spilledWh: harvestWh * 0.6,
      frozenSpilledWh: 0,
      storeChargeLossWh: harvestWh * 0.1,
      storeOutputLossWh: 4.9,
      converterLossWh: 3.2,
      deviceChargeLossWh: 2.4,
      toppedUpWh: dry ? 12 : 32.8,
      deliveredWh: dry ? 14 : demandWhPerDay,
      unmetWh: dry ? demandWhPerDay - 14 : 0,
      storedStartWh,
      storedEndWh,
      storesStartWh: storedStartWh - 40,
      storesEndWh: storedEndWh - 40,
      devicesStartWh: 40,
      devicesEndWh: 40,
      frozenHours: dayIndex === 0 ? 3 : 0,
    };
  });
  const seriesOf = (scale: number) =>
    days.flatMap(({ dayIndex }) => {
      const day = ledgerDays[dayIndex];
      return Array.from({ length: 24 }, (_, h) => ({
        t: iso(tripStartMs + (dayIndex * 24 + h + 1) * msPerHour),
        storedWh: day ? (day.storedStartWh + ((day.storedEndWh - day.storedStartWh) * (h + 1)) / 24) * scale : 0,
      }));
    });
  const sunPath = (dayIndex: number, peakDeg: number) => ({
    dayIndex,
    date: dateOf(dayIndex),
    points: Array.from({ length: 24 }, (_, h) => {
      const ms = tripStartMs + (dayIndex * 24 + h) * msPerHour;
      const localH = (h + 8.5) % 24;
      return {
        t: iso(ms),
        localTime: localTimeAt(ms),
        altitudeDeg: peakDeg * Math.sin((Math.PI * (localH - 6)) / 12.5),
        azimuthDeg: (localH * 15 + 180) % 360,
      };
    }),
  });
  const session = (
    dayIndex: number,
    kind: ChargeSessionJson['kind'],
    from: { id: string; name: string },
    to: { id: string; name: string },
    startH: number,
    lengthH: number,
    energyWh: number,
    converterItemId: string | null,
    leadItemIds: string[],
  ): ChargeSessionJson => {
    const startMs = tripStartMs + (dayIndex * 24 + startH) * msPerHour;
    return {
      kind,
      dayIndex,
      fromId: from.id,
      toId: to.id,
      fromName: from.name,
      toName: to.name,
      converterItemId,
      leadItemIds,
      startLocalTime: localTimeAt(startMs),
      start: iso(startMs),
      end: iso(startMs + lengthH * msPerHour),
      energyWh,
    };
  };
  const g = fixtureGear;
  const bank = { id: `${g.bigBank.itemId}#1`, name: g.bigBank.name };
  const schedule = days.flatMap(({ dayIndex }) => [
    ...(hasPanel
      ? [
          session(dayIndex, 'harvest', { id: g.panel.itemId, name: g.panel.name }, bank, 0, 6, 20.8, null, [
            g.usbLead.itemId,
          ]),
        ]
      : []),
    session(
      dayIndex,
      'top-up',
      bank,
      { id: fixtureDevices.radio.deviceId, name: fixtureDevices.radio.name },
      7.5,
      16.5,
      22.4,
      g.boost.itemId,
      [g.dcLead.itemId],
    ),
    session(
      dayIndex,
      'top-up',
      bank,
      { id: fixtureDevices.phone.deviceId, name: fixtureDevices.phone.name },
      7.5,
      16.5,
      10.4,
      null,
      [g.usbLead.itemId],
    ),
  ]);
  const dry = dryFromDayIndex !== null;
  const lastDay = days.length - 1;
  const massG = lines.reduce((sum, line) => sum + line.massG, 0);
  return {
    verdict: {
      status: dry ? 'runs-dry' : 'lasts-trip',
      text: dry
        ? `Runs dry on day ${(dryFromDayIndex ?? 0) + 1} in the expected sky: Test handheld radio runs out — charging it would take a store below its reserve.`
        : 'Lasts the trip: 16 % to spare on the worst day; it would run dry on day 9 if the trip went on.',
      dayIndex: dry ? dryFromDayIndex : null,
      deviceId: dry ? fixtureDevices.radio.deviceId : null,
      worstMarginShare: dry ? null : 0.16,
      wouldRunDryOnDayIndex: dry ? null : 8,
      ...verdict,
    },
    bindingSkyId,
    dayStrip: days.map(({ dayIndex, share }) => ({
      dayIndex,
      date: dateOf(dayIndex),
      storedEndWh: share * totalStorageWh,
      storedEndShare: share,
      dry: dryFromDayIndex !== null && dayIndex >= dryFromDayIndex,
    })),
    ledgers:
      bindingSkyId === 'expected'
        ? [{ skyId: 'expected', days: ledgerDays }]
        : [
            { skyId: bindingSkyId, days: ledgerDays },
            { skyId: 'expected', days: ledgerDays.map((d) => ({ ...d, harvestWh: d.harvestWh + 5 })) },
          ],
    storedSeries:
      bindingSkyId === 'expected'
        ? [{ skyId: 'expected', points: seriesOf(1) }]
        : [
            { skyId: bindingSkyId, points: seriesOf(1) },
            { skyId: 'expected', points: seriesOf(1.1) },
          ],
    dailyBalance: ledgerDays.map((d) => ({
      dayIndex: d.dayIndex,
      date: dateOf(d.dayIndex),
      harvestWh: d.harvestWh,
      demandWh: demandWhPerDay,
    })),
    sunPaths: lastDay > 0 ? [sunPath(0, 78), sunPath(lastDay, 74)] : [sunPath(0, 78)],
    schedule,
    cautions: cautionIds.flatMap((id) => {
      const caution = cautionTexts[id];
      return caution ? [{ id, ...caution }] : [];
    }),
    unusedItemIds: [],
    massG,
    storageWh: 110,
  };
};

/** A plan as the solver answers it; `status` and the kit decide the headline. */
export const buildPlanResult = (overrides: Partial<PlanResult> = {}, evaluation = buildEvaluation()): PlanResult => {
  const kit = buildPlanKit(optimumLines());
  return planResultSchema.parse({
    modelVersion: planModelVersion,
    status: 'optimal',
    headline: `The lightest kit that works weighs ${kit.massG} g. ${evaluation.verdict.text}`,
    kit,
    evaluation,
    swaps: [
      {
        kit: buildPlanKit(kitLines({ panel: 1, bigBank: 2, boost: 1, dcLead: 1, usbLead: 1 })),
        extraG: 245,
        added: [{ itemId: fixtureGear.bigBank.itemId, name: fixtureGear.bigBank.name, count: 1 }],
        removed: [{ itemId: fixtureGear.smallBank.itemId, name: fixtureGear.smallBank.name, count: 1 }],
        buys: ['more-margin'],
        worstMarginShare: 0.31,
        text: '245 g more: adds Test bank 20 000 mAh; leaves Test bank 5 000 mAh at home — more to spare on the worst day. 31 % to spare on the worst day.',
      },
    ],
    gramPrices: [
      {
        requirement: 'transmit-minutes',
        change: '10 more transmit minutes a day',
        kind: 'grams',
        extraG: 85,
        freeUpTo: null,
        text: '10 more transmit minutes a day cost 85 g.',
      },
      {
        requirement: 'reserve',
        change: 'a reserve 10 points higher',
        kind: 'free',
        extraG: 0,
        freeUpTo: '20 more points',
        text: 'A reserve 10 points higher: free — this kit has room for 20 more points.',
      },
    ],
    nothingFeasible: null,
    pathChoice: null,
    notes: [],
    stats: { rounds: 12, judgedKits: 88, activeItems: 7, candidateItems: 7, optimumMs: 1850, totalMs: 4200 },
    ...overrides,
  });
};

/** The answer when nothing fits the gram limit. */
export const buildOverLimitResult = (): PlanResult => {
  const kit = buildPlanKit(optimumLines(), 800);
  return buildPlanResult({
    status: 'over-limit',
    kit,
    headline: `Nothing that works fits under 800 g: the lightest kit that does weighs ${kit.massG} g, ${kit.overLimitG} g over the limit.`,
  });
};

/** The answer when no kit from the gear keeps every device charged. */
export const buildNothingFeasibleResult = (): PlanResult => {
  const missing = [
    'Nothing in this gear can charge Test handheld radio: it needs a boost converter from a USB voltage this bank offers to 11–16 V.',
    'Even with all this gear packed, the stores run 12.4 Wh short on day 4 in a cloudy run mid-trip.',
  ];
  return buildPlanResult({
    status: 'nothing-feasible',
    headline: `No kit from this gear keeps every device charged. ${missing.join(' ')}`,
    kit: null,
    evaluation: null,
    swaps: [],
    gramPrices: [],
    nothingFeasible: {
      missing,
      shortfalls: [{ skyId: 'cloudy-middle', dayIndex: 3, shortWh: 12.4 }],
      runsDry: { dayIndex: 3, deviceId: fixtureDevices.radio.deviceId, skyId: 'cloudy-middle' },
      text: missing.join(' '),
    },
  });
};

let nextPlan = 1;
export const buildPlanRecord = (
  result: PlanResult = buildPlanResult(),
  overrides: Partial<PlanRecord> = {},
): PlanRecord =>
  planRecordSchema.parse({
    id: uuid('8d00', nextPlan++),
    tripId: planTripId,
    createdAt: '2027-02-20T10:15:00.000Z',
    createdBy: planLeaderId,
    modelVersion: result.modelVersion,
    durationMs: result.stats.totalMs,
    result,
    ...overrides,
  });

/** What the check route answers for these lines; without a panel the fixture runs dry on day 3. */
export const buildCheckResult = (
  lines: PlanKitLine[],
  shaves: CheckResult['shaves'] = [],
  untriedChanges = 0,
): CheckResult => {
  const hasPanel = lines.some((line) => line.kind === 'panel');
  const evaluation = hasPanel
    ? buildEvaluation({ lines })
    : buildEvaluation({
        lines,
        storedEndShares: [0.69, 0.37, 0.15, 0.1, 0.09, 0.08],
        dryFromDayIndex: 2,
        bindingSkyId: 'expected',
      });
  return checkResultSchema.parse({ kit: buildPlanKit(lines), evaluation, shaves, untriedChanges });
};

export const buildChosenKit = (lines: PlanKitLine[] = optimumLines(), overrides: Partial<ChosenKit> = {}): ChosenKit =>
  chosenKitSchema.parse({
    kit: buildPlanKit(lines),
    source: 'optimum',
    planId: null,
    updatedAt: '2027-02-20T10:16:00.000Z',
    evaluation: buildEvaluation({ lines }),
    modelVersion: planModelVersion,
    ...overrides,
  });

/** A trip as `GET /api/trips/:id` answers it, with the test leader and the radio and phone. */
export const buildPlanTrip = (myRole: Trip['myRole'] = 'leader'): Trip => {
  const solarInput = {
    latitudeDeg: -29.4,
    longitudeDeg: 29.3,
    timeZone: 'Africa/Johannesburg',
    startDate: '2027-03-10',
    nights: 5,
    walkWindow: { start: '08:30', end: '16:00' },
    campWindow: { start: '16:00', end: '08:30' },
    walkingBearingsDeg: null,
    carry: { walking: 'pack', camp: 'propped' },
    reaimEveryH: 2,
    sky: { clearShare: 0.5, cloudyPersistence: 0.5, cloudyTransmission: 0.25, canopyShade: 0, designLikelihood: 0.9 },
    temperatures: { lowC: 2, highC: 16 },
    groundAlbedo: 0.2,
    stepMinutes: 60,
    elevationM: 2800,
    linkeTurbidity: 3,
  };
  const device = (deviceId: string, n: number, name: string, massG: number, spec: Record<string, unknown>) => ({
    id: deviceId,
    itemId: uuid('8e00', n),
    name,
    notes: '',
    massG,
    ownerAccountId: planLeaderId,
    carrierAccountId: planLeaderId,
    spec: { kind: 'device', massG, ...spec },
    defaultUseProfile: spec.useProfile,
    useProfileOverride: null,
    useProfile: spec.useProfile,
    overriddenFields: [],
    overrideIssues: [],
    createdAt: '2027-02-01T08:00:00.000Z',
    updatedAt: '2027-02-01T08:00:00.000Z',
  });
  return tripSchema.parse({
    ...solarInput,
    solarInput,
    id: planTripId,
    name: 'Test high route',
    notes: '',
    skyPresetId: 'mixed',
    reserveShare: 0.1,
    gramLimitG: 1200,
    timeZoneDerived: false,
    endDate: '2027-03-15',
    phase: 'upcoming',
    myRole,
    createdAt: '2027-02-01T08:00:00.000Z',
    updatedAt: '2027-02-01T08:00:00.000Z',
    members: [
      {
        accountId: planLeaderId,
        displayName: 'Test Leader',
        email: 'leader@example.test',
        role: 'leader',
        gramLimitG: null,
        joinedAt: '2027-02-01T08:00:00.000Z',
      },
    ],
    devices: [
      device(fixtureDevices.radio.deviceId, 1, fixtureDevices.radio.name, 310, {
        deviceKind: 'radio',
        ownBatteryWh: 13.3,
        chargesVia: '12v-dc',
        chargeCurrentA: 0.6,
        chargeEfficiency: 0.8,
        chargePort: { connector: 'radio-dc', captiveCable: false },
        supplyVoltsNominal: 13.8,
        supplyVoltsMin: 11,
        supplyVoltsMax: 16,
        transmitCurrentA: 1.5,
        receiveCurrentA: 0.15,
        standbyCurrentA: 0.05,
        canRunLive: true,
        useProfile: { basis: 'radio-hours', transmitMinutesPerDay: 20, receiveHoursPerDay: 2, standbyHoursPerDay: 6 },
      }),
      device(fixtureDevices.phone.deviceId, 2, fixtureDevices.phone.name, 190, {
        deviceKind: 'phone',
        ownBatteryWh: 17,
        chargesVia: 'usb-5v',
        chargePowerW: 10,
        chargeEfficiency: 0.85,
        chargePort: { connector: 'usb-c', captiveCable: false },
        canRunLive: false,
        useProfile: { basis: 'battery-share', batterySharePerDay: 0.6 },
      }),
    ],
  });
};
