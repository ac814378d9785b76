import { queryOptions, useQuery } from '@tanstack/react-query';
import type { TripSummary } from '@gramwatt/shared';
import { api } from '@/lib/api-client';
import { tripsQueryKey } from '@/lib/react-query';

/** `GET /api/trips`: upcoming and ongoing first (soonest first), then past ones (latest first). */
export const getTrips = (signal?: AbortSignal) => api.get<{ trips: TripSummary[] }>('/trips', signal);

export const getTripsQueryOptions = () =>
  queryOptions({ queryKey: tripsQueryKey, queryFn: ({ signal }) => getTrips(signal) });

export const useTrips = () => useQuery(getTripsQueryOptions());
