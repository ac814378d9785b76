import { queryOptions, useQuery } from '@tanstack/react-query';
import type { Trip } from '@gramwatt/shared';
import { api } from '@/lib/api-client';
import { tripsQueryKey } from '@/lib/react-query';

/** `GET /api/trips/:id`: fields, members, devices with effective use profiles. */
export const getTrip = async (tripId: string, signal?: AbortSignal): Promise<Trip> =>
  (await api.get<{ trip: Trip }>(`/trips/${encodeURIComponent(tripId)}`, signal)).trip;

export const getTripQueryOptions = (tripId: string) =>
  queryOptions({ queryKey: [...tripsQueryKey, tripId], queryFn: ({ signal }) => getTrip(tripId, signal) });

export const useTrip = (tripId: string) => useQuery(getTripQueryOptions(tripId));
