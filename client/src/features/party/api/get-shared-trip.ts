import type { SharedTrip } from '@gramwatt/shared';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';

/** `GET /api/share/:token` (no account): the trip read-only. 404 not a link of ours; 410 expired or revoked. */
export const getSharedTrip = async (token: string, signal?: AbortSignal): Promise<SharedTrip> =>
  (await api.get<{ trip: SharedTrip }>(`/share/${encodeURIComponent(token)}`, signal)).trip;

export const getSharedTripQueryOptions = (token: string) =>
  queryOptions({ queryKey: ['shared-trip', token], queryFn: ({ signal }) => getSharedTrip(token, signal) });

export const useSharedTrip = (token: string) => useQuery(getSharedTripQueryOptions(token));
