import type { PoolListResponse } from '@gramwatt/shared';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { partyKeys, tripPath } from './party-keys';

/** `GET /api/trips/:id/pool` (any member): the shared gear with owners, and whether the leader's whole locker counts. */
export const getPool = (tripId: string, signal?: AbortSignal): Promise<PoolListResponse> =>
  api.get<PoolListResponse>(`${tripPath(tripId)}/pool`, signal);

export const getPoolQueryOptions = (tripId: string) =>
  queryOptions({ queryKey: partyKeys.pool(tripId), queryFn: ({ signal }) => getPool(tripId, signal) });

export const usePool = (tripId: string) => useQuery(getPoolQueryOptions(tripId));
