import { describe, expect, it } from 'vitest';
import { buildEvaluation, buildPlanKit, buildPlanTrip, fixtureGear, kitLines, optimumLines } from '@/testing/plan-data';
import { hopsOf, packsByCarrier, scheduleKindLabels, scheduleRows } from './packing';

const trip = buildPlanTrip();
const leader = trip.members[0]!;
const partner = {
  ...leader,
  accountId: '00000000-0000-4000-a000-000000000099',
  displayName: 'Test Partner',
  role: 'partner' as const,
};
const [radio, phone] = trip.devices;

describe('packsByCarrier', () => {
  it('gives a solo trip’s whole kit and every device to the leader', () => {
    const packs = packsByCarrier(buildPlanKit(optimumLines()), trip.members, trip.devices);
    expect(packs).toHaveLength(1);
    expect(packs[0]).toMatchObject({ name: 'Test Leader', role: 'leader', kit: { massG: 893 } });
    expect(packs[0]?.devices.map((d) => d.name)).toEqual(['Test handheld radio', 'Test phone']);
  });

  it('follows a party plan’s carriers, their own limits, and each device’s carrier; the leader first', () => {
    const theirs = kitLines({ smallBank: 1, usbLead: 1 });
    const kit = {
      ...buildPlanKit(optimumLines()),
      carriers: [
        { memberId: partner.accountId, name: 'Test Partner', lines: theirs, massG: 133, gramLimitG: 100, overG: 33 },
        {
          memberId: leader.accountId,
          name: 'Test Leader',
          lines: kitLines({ panel: 1 }),
          massG: 320,
          gramLimitG: null,
          overG: 0,
        },
      ],
    };
    const packs = packsByCarrier(kit, [leader, partner], [radio!, { ...phone!, carrierAccountId: partner.accountId }]);
    expect(packs.map((p) => [p.name, p.lines.length, p.devices.map((d) => d.name)])).toEqual([
      ['Test Leader', 1, ['Test handheld radio']],
      ['Test Partner', 2, ['Test phone']],
    ]);
    expect(packs[1]?.kit).toEqual({ massG: 133, gramLimitG: 100, overLimitG: 33 });
  });

  it('adds a member who carries only devices', () => {
    const packs = packsByCarrier(
      buildPlanKit(optimumLines()),
      [leader, partner],
      [{ ...phone!, carrierAccountId: partner.accountId }],
    );
    expect(packs[1]).toMatchObject({ name: 'Test Partner', role: 'partner', lines: [], kit: null });
  });
});

describe('scheduleRows', () => {
  it('marks what starts in the small hours as the next morning of the trip day', () => {
    const evaluation = buildEvaluation();
    const lines = optimumLines();
    const early = {
      ...evaluation.schedule[0]!,
      startLocalTime: '05:30',
      start: '2027-03-11T03:30:00.000Z',
      end: '2027-03-11T06:30:00.000Z',
    };
    const rows = scheduleRows({ ...evaluation, schedule: [early, evaluation.schedule[1]!] }, lines);
    expect(rows.map((r) => [r.start, r.startsNextMorning, r.end])).toEqual([
      ['16:00', false, { time: '08:30', daysLater: 1 }],
      ['05:30', true, { time: '08:30', daysLater: 0 }],
    ]);
    expect(rows[0]?.via).toBe(fixtureGear.boost.name);
  });
});

describe('scheduleRows with two units of one bank', () => {
  it('makes one row of the sessions that draw on both units over the same hours, and names a lone unit', () => {
    const evaluation = buildEvaluation();
    const lines = kitLines({ panel: 1, bigBank: 2, boost: 1, dcLead: 1, usbLead: 1 });
    const bank = fixtureGear.bigBank;
    const topUp = evaluation.schedule.find((s) => s.kind === 'top-up')!;
    const unit = (n: number, energyWh: number, hours = 0) => ({
      ...topUp,
      fromId: `${bank.itemId}#${n}`,
      fromName: bank.name,
      start: new Date(Date.parse(topUp.start) + hours * 3_600_000).toISOString(),
      end: new Date(Date.parse(topUp.end) + hours * 3_600_000).toISOString(),
      energyWh,
    });
    const rows = scheduleRows({ ...evaluation, schedule: [unit(1, 2), unit(2, 1.5), unit(2, 0.5, 1)] }, lines);
    expect(rows.map((r) => [r.from, r.energyWh])).toEqual([
      [`${bank.name} (both)`, 3.5],
      [`${bank.name} (2nd)`, 0.5],
    ]);
  });

  it('lists the hop from both units as one line (one lead, moved from unit to unit)', () => {
    const evaluation = buildEvaluation();
    const lines = kitLines({ panel: 1, bigBank: 2, boost: 1, dcLead: 1, usbLead: 1 });
    const bank = fixtureGear.bigBank;
    const topUp = evaluation.schedule.find((s) => s.kind === 'top-up')!;
    const hops = hopsOf(
      { schedule: [1, 2].map((n) => ({ ...topUp, fromId: `${bank.itemId}#${n}`, fromName: bank.name })) },
      lines,
    );
    expect(hops.map((h) => h.from)).toEqual([`${bank.name} (both)`]);
  });
});

describe('hopsOf with the 12 V path', () => {
  it('orders sun into stores, then top-ups, then a radio run live from its pack', () => {
    const session = (kind: 'harvest' | 'top-up' | 'live', fromId: string, toId: string) => ({
      kind,
      dayIndex: 0,
      fromId,
      toId,
      fromName: fromId,
      toName: toId,
      converterItemId: null,
      leadItemIds: [],
      startLocalTime: '10:00',
      start: '2027-07-10T10:00:00.000Z',
      end: '2027-07-10T11:00:00.000Z',
      energyWh: 1,
    });
    const hops = hopsOf(
      {
        schedule: [
          session('live', 'pack#1', 'radio'),
          session('top-up', 'pack#1', 'radio'),
          session('harvest', 'panel', 'pack#1'),
          session('live', 'pack#1', 'handheld'),
        ],
      },
      [],
    );
    // The radio's top-up and live hop are one line (same pack, same lead).
    expect(hops.map((h) => [h.kind, h.to])).toEqual([
      ['harvest', 'pack#1'],
      ['top-up', 'radio'],
      ['live', 'handheld'],
    ]);
    expect(scheduleKindLabels.live).toBe('Runs live: ');
  });
});
