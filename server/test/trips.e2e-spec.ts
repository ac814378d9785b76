import { computeTripSolar, skyPresetValues, tripSolarInputSchema } from '@gramwatt/shared';
import { eq } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { tripMembers, trips } from '../src/database/schema';
import { type TestApp, startTestApp } from './support/test-app';
import { type Hiker, createTrip, errorPaths, signedInHiker, tripBody } from './support/trip-fixtures';

describe('trips: create, read, replace, delete', () => {
  let t: TestApp;
  let fern: Hiker;

  beforeAll(async () => {
    t = await startTestApp();
    fern = await signedInHiker(t);
  });

  afterAll(async () => {
    await t.close();
  });

  it('needs a session', async () => {
    await t.http().get('/api/trips').expect(401);
    await t.http().post('/api/trips').send(tripBody()).expect(401);
  });

  it('creates a trip with defaults for everything but the place and dates, the creator as leader', async () => {
    const response = await t
      .http()
      .post('/api/trips')
      .set(fern.auth)
      .send({ name: 'Lakes traverse', latitudeDeg: 61.2, longitudeDeg: 8.4, startDate: '2026-07-10', nights: 4 })
      .expect(201);
    const trip = response.body.trip;
    expect(trip).toMatchObject({
      name: 'Lakes traverse',
      notes: '',
      startDate: '2026-07-10',
      endDate: '2026-07-14',
      nights: 4,
      timeZone: 'Europe/Oslo',
      timeZoneDerived: true,
      skyPresetId: 'mixed',
      sky: skyPresetValues('mixed'),
      walkWindow: { start: '08:00', end: '16:00' },
      campWindow: { start: '16:00', end: '08:00' },
      carry: { walking: 'pack', camp: 'propped' },
      reaimEveryH: 2,
      gramLimitG: null,
      myRole: 'leader',
      phase: 'upcoming',
      devices: [],
    });
    expect(trip.reserveShare).toBeGreaterThan(0);
    expect(trip.members).toEqual([
      expect.objectContaining({ accountId: fern.id, email: fern.email, role: 'leader', gramLimitG: null }),
    ]);
    // The engine input is complete: computeTripSolar takes it as it is (N nights → N + 1 days).
    expect(tripSolarInputSchema.parse(trip.solarInput)).toEqual(trip.solarInput);
    expect(computeTripSolar(trip.solarInput).days).toHaveLength(5);
  });

  it('reads, replaces (PUT: omitted fields take their defaults) and deletes a trip', async () => {
    const created = await createTrip(t, fern, {
      notes: 'Water at every camp',
      gramLimitG: 900,
      skyPresetId: 'open-sky',
      walkingBearingsDeg: [45],
      temperatures: { lowC: -2, highC: 12 },
    });
    const read = await t.http().get(`/api/trips/${created.id}`).set(fern.auth).expect(200);
    expect(read.body.trip).toMatchObject({
      notes: 'Water at every camp',
      gramLimitG: 900,
      skyPresetId: 'open-sky',
      sky: skyPresetValues('open-sky'),
      walkingBearingsDeg: [45],
      temperatures: { lowC: -2, highC: 12 },
    });

    t.clock.advanceS(60);
    const sky = {
      clearShare: 0.6,
      cloudyPersistence: 0.6,
      cloudyTransmission: 0.2,
      canopyShade: 0.4,
      designLikelihood: 0.95,
    };
    const replaced = await t
      .http()
      .put(`/api/trips/${created.id}`)
      .set(fern.auth)
      .send(
        tripBody({
          name: 'Lakes traverse, long',
          nights: 9,
          sky,
          reserveShare: 0.3,
          campWindow: { start: '17:30', end: '07:00' },
        }),
      )
      .expect(200);
    expect(replaced.body.trip).toMatchObject({
      name: 'Lakes traverse, long',
      nights: 9,
      endDate: '2026-07-19',
      sky,
      skyPresetId: null,
      reserveShare: 0.3,
      campWindow: { start: '17:30', end: '07:00' },
      notes: '',
      gramLimitG: null,
      walkingBearingsDeg: null,
    });
    expect(replaced.body.trip.solarInput).toMatchObject({
      nights: 9,
      sky,
      campWindow: { start: '17:30', end: '07:00' },
    });
    expect(Date.parse(replaced.body.trip.updatedAt)).toBeGreaterThan(Date.parse(replaced.body.trip.createdAt));

    await t.http().delete(`/api/trips/${created.id}`).set(fern.auth).expect(204);
    await t.http().get(`/api/trips/${created.id}`).set(fern.auth).expect(404);
    expect(await t.db.select().from(tripMembers).where(eq(tripMembers.tripId, created.id))).toEqual([]);
  });

  it('keeps a time zone that is given, and derives it from the point when left out', async () => {
    const given = await createTrip(t, fern, { latitudeDeg: -43.5, longitudeDeg: 170.5, timeZone: 'Pacific/Auckland' });
    expect(given).toMatchObject({ timeZone: 'Pacific/Auckland', timeZoneDerived: false });
    // Point near the principal city of America/Denver in the IANA tz database's zone.tab (+394421−1045903).
    const derived = await createTrip(t, fern, { latitudeDeg: 39.74, longitudeDeg: -104.98, timeZone: undefined });
    expect(derived).toMatchObject({ timeZone: 'America/Denver', timeZoneDerived: true });
  });

  describe('validation: 400 with the field path', () => {
    const cases: [label: string, overrides: Record<string, unknown>, paths: string[]][] = [
      ['0 nights', { nights: 0 }, ['nights']],
      ['61 nights', { nights: 61 }, ['nights']],
      ['a fractional night', { nights: 2.5 }, ['nights']],
      ['latitude 91', { latitudeDeg: 91 }, ['latitudeDeg']],
      ['longitude −181', { longitudeDeg: -181 }, ['longitudeDeg']],
      ['an unknown time zone', { timeZone: 'Europe/Atlantis' }, ['timeZone']],
      ['a date that does not exist', { startDate: '2026-02-30' }, ['startDate']],
      ['a camp window of zero length', { campWindow: { start: '18:00', end: '18:00' } }, ['campWindow.end']],
      ['a walking window with a bad clock time', { walkWindow: { start: '8', end: '16:00' } }, ['walkWindow.start']],
      ['a reserve share above 1', { reserveShare: 1.5 }, ['reserveShare']],
      ['a negative reserve share', { reserveShare: -0.1 }, ['reserveShare']],
      [
        'a clear-day share above 1',
        {
          sky: {
            clearShare: 1.2,
            cloudyPersistence: 0.5,
            cloudyTransmission: 0.2,
            canopyShade: 0,
            designLikelihood: 0.9,
          },
        },
        ['sky.clearShare'],
      ],
      [
        'a canopy shade below 0',
        {
          sky: {
            clearShare: 0.5,
            cloudyPersistence: 0.5,
            cloudyTransmission: 0.2,
            canopyShade: -0.2,
            designLikelihood: 0.9,
          },
        },
        ['sky.canopyShade'],
      ],
      [
        // p = 0.2 needs q ≥ 1 − p/(1 − p) = 0.75 for the two-state chain to exist.
        'an impossible p/q pair',
        {
          sky: {
            clearShare: 0.2,
            cloudyPersistence: 0.5,
            cloudyTransmission: 0.2,
            canopyShade: 0,
            designLikelihood: 0.9,
          },
        },
        ['sky.cloudyPersistence'],
      ],
      ['an unknown sky preset', { skyPresetId: 'drizzle' }, ['skyPresetId']],
      ['bearings neither one nor one per day', { walkingBearingsDeg: [10, 20] }, ['walkingBearingsDeg']],
      ['a daily low above the high', { temperatures: { lowC: 15, highC: 5 } }, ['temperatures.lowC']],
      ['a re-aim interval of 0 h', { reaimEveryH: 0 }, ['reaimEveryH']],
      ['an unknown carry mode', { carry: { walking: 'hat', camp: 'propped' } }, ['carry.walking']],
      ['a gram limit of 0', { gramLimitG: 0 }, ['gramLimitG']],
      ['no name', { name: '' }, ['name']],
      ['no start date', { startDate: undefined }, ['startDate']],
    ];

    it.each(cases)('refuses %s', async (label, overrides, paths) => {
      const before = await t.db.select({ id: trips.id }).from(trips);
      const response = await t.http().post('/api/trips').set(fern.auth).send(tripBody(overrides)).expect(400);
      // The sky schema's cloud-chain check also runs on an out-of-range p (it reports q as well).
      if (label === 'a clear-day share above 1') expect(errorPaths(response)).toEqual(expect.arrayContaining(paths));
      else expect(errorPaths(response)).toEqual(paths);
      expect(response.body.errors[0].message).toEqual(expect.any(String));
      expect(await t.db.select({ id: trips.id }).from(trips)).toHaveLength(before.length);
    });

    it('refuses a bad replacement and leaves the trip as it was', async () => {
      const created = await createTrip(t, fern, { nights: 3 });
      const response = await t
        .http()
        .put(`/api/trips/${created.id}`)
        .set(fern.auth)
        .send(tripBody({ nights: 61 }))
        .expect(400);
      expect(errorPaths(response)).toEqual(['nights']);
      const read = await t.http().get(`/api/trips/${created.id}`).set(fern.auth).expect(200);
      expect(read.body.trip.nights).toBe(3);
    });
  });
});

describe('trips: list order', () => {
  let t: TestApp;

  beforeAll(async () => {
    t = await startTestApp();
  });

  afterAll(async () => {
    await t.close();
  });

  it('lists ongoing and upcoming trips first (soonest first), then past ones (latest first), by the injected clock', async () => {
    const hiker = await signedInHiker(t);
    // The test clock starts at 2026-06-01T08:00Z: 10:00 on 1 June in Europe/Oslo.
    const named = async (name: string, startDate: string, nights: number) =>
      createTrip(t, hiker, { name, startDate, nights });
    await named('past, long ago', '2025-08-01', 5);
    await named('upcoming, later', '2026-09-01', 3);
    await named('past, last month', '2026-05-01', 2);
    await named('ongoing', '2026-05-30', 4);
    await named('upcoming, soon', '2026-06-02', 2);

    const listed = await t.http().get('/api/trips').set(hiker.auth).expect(200);
    expect(listed.body.trips.map((trip: { name: string }) => trip.name)).toEqual([
      'ongoing',
      'upcoming, soon',
      'upcoming, later',
      'past, last month',
      'past, long ago',
    ]);
    expect(listed.body.trips.map((trip: { phase: string }) => trip.phase)).toEqual([
      'ongoing',
      'upcoming',
      'upcoming',
      'past',
      'past',
    ]);
    expect(listed.body.trips[0]).toMatchObject({
      myRole: 'leader',
      memberCount: 1,
      deviceCount: 0,
      endDate: '2026-06-03',
    });

    // Three days on (4 June), the ongoing trip (last day 3 June) is past and "soon" (2–4 June) is ongoing.
    t.clock.advanceS(3 * 24 * 3600);
    const later = await t.http().get('/api/trips').set(hiker.auth).expect(200);
    expect(later.body.trips.map((trip: { name: string }) => trip.name)).toEqual([
      'upcoming, soon',
      'upcoming, later',
      'ongoing',
      'past, last month',
      'past, long ago',
    ]);
  });

  it('shows only the caller’s own trips', async () => {
    const one = await signedInHiker(t);
    const other = await signedInHiker(t);
    await createTrip(t, one, { name: 'mine' });
    const listed = await t.http().get('/api/trips').set(other.auth).expect(200);
    expect(listed.body.trips).toEqual([]);
  });
});

describe('trips: OpenAPI', () => {
  let t: TestApp;

  beforeAll(async () => {
    t = await startTestApp();
  });

  afterAll(async () => {
    await t.close();
  });

  it('documents the trip routes and schemas with units in the field names', async () => {
    const response = await t.http().get('/api/docs-json').expect(200);
    const doc = JSON.stringify(response.body);
    for (const path of [
      '/api/trips',
      '/api/trips/{id}',
      '/api/trips/{id}/members',
      '/api/trips/{id}/devices',
      '/api/trips/{id}/devices/{deviceId}',
    ]) {
      expect(Object.keys(response.body.paths)).toContain(path);
    }
    for (const field of [
      'latitudeDeg',
      'longitudeDeg',
      'reaimEveryH',
      'gramLimitG',
      'reserveShare',
      'transmitMinutesPerDay',
      'solarInput',
    ]) {
      expect(doc).toContain(`"${field}"`);
    }
    const schemas = Object.keys(response.body.components.schemas);
    expect(schemas).toEqual(
      expect.arrayContaining(['TripInputDto', 'TripResponseDto_Output', 'TripDeviceAddDto', 'TripDeviceUpdateDto']),
    );
  });
});
