import { queryOptions, useQuery } from '@tanstack/react-query';
import type { Trip } from '@gramwatt/shared';
import { api } from '@/lib/api-client';
import { tripPath } from './trip-path';

/** `GET /api/trips/:id` under the trip page's own cache key: the packing list needs its members and devices. */
export const getTripQueryOptions = (tripId: string) =>
  queryOptions({
    queryKey: ['trips', tripId],
    queryFn: async ({ signal }) => (await api.get<{ trip: Trip }>(tripPath(tripId), signal)).trip,
  });

/** The trip's name and dates, its members (who carry the kit) and its devices (each with its carrier). */
export const useTripParty = (tripId: string) =>
  useQuery({
    ...getTripQueryOptions(tripId),
    select: (trip) => ({
      name: trip.name,
      startDate: trip.startDate,
      endDate: trip.endDate,
      days: trip.nights + 1,
      timeZone: trip.timeZone,
      members: trip.members,
      devices: trip.devices,
    }),
  });

/** When the trip or one of its devices last changed (ISO), to tell whether a plan still fits the trip. */
export const useTripChangedAt = (tripId: string) =>
  useQuery({
    ...getTripQueryOptions(tripId),
    select: (trip) =>
      [trip.updatedAt, ...trip.devices.map((device) => device.updatedAt)].reduce((latest, at) =>
        Date.parse(at) > Date.parse(latest) ? at : latest,
      ),
  });

/**
 * Whether a plan or a chosen kit made at `madeAt` is out of date: the trip (its fields, devices and their locker
 * specs; `tripChangedAt`, undefined while it loads) or the gear it weighed (`gearChangedAt`) changed after it.
 */
export const changedAfter = (
  madeAt: string,
  tripChangedAt: string | undefined,
  gearChangedAt: string | null,
): boolean =>
  tripChangedAt !== undefined &&
  Math.max(Date.parse(tripChangedAt), gearChangedAt ? Date.parse(gearChangedAt) : 0) > Date.parse(madeAt);
