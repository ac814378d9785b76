import { queryOptions, useQuery } from '@tanstack/react-query';
import type { PoolListResponse } from '@gramwatt/shared';
import { api } from '@/lib/api-client';
import { getLockerItemsQueryOptions } from './get-power-gear';
import { tripPath } from './trip-path';

/** `GET /api/trips/:id/pool` under the party's own cache key: the gear members share into the trip's plan. */
export const getPoolQueryOptions = (tripId: string) =>
  queryOptions({
    queryKey: ['trips', tripId, 'pool'],
    queryFn: ({ signal }) => api.get<PoolListResponse>(tripPath(tripId, 'pool'), signal),
  });

/** A piece of power gear the trip's plan may use, with how many of it can go. */
export interface PickableGear {
  itemId: string;
  name: string;
  kind: string;
  /** Grams of one unit. */
  massG: number;
  /** The most units a kit may hold: the pooled count, within what the owner still owns. */
  maxCount: number;
  /** Whose it is, when not the caller's own. */
  ownerName: string | null;
}

export interface TripGear {
  gear: PickableGear[];
  /** The leader's whole locker counts in the plan, but only the leader can see it to pick from. */
  leaderLockerHidden: boolean;
}

/**
 * The gear a kit for this trip may hold, as the planner sees it: the party's pool, and the leader's whole locker
 * while the leader has pooled nothing of their own (read from the locker when the caller is the leader).
 */
export const useTripGear = (tripId: string, callerIsLeader: boolean) => {
  const pool = useQuery(getPoolQueryOptions(tripId));
  const wholeLocker = pool.data?.leaderWholeLocker === true;
  const locker = useQuery({ ...getLockerItemsQueryOptions(), enabled: callerIsLeader && wholeLocker });
  const isPending = pool.isPending || (callerIsLeader && wholeLocker && locker.isPending);
  const error = pool.error ?? (callerIsLeader && wholeLocker ? locker.error : null);
  let data: TripGear | undefined;
  if (!isPending && !error && pool.data) {
    const fromLocker: PickableGear[] =
      callerIsLeader && wholeLocker
        ? (locker.data?.items ?? [])
            .filter((item) => item.kind !== 'device' && item.countOwned > 0)
            .map((item) => ({
              itemId: item.id,
              name: item.name,
              kind: item.kind,
              massG: item.massG,
              maxCount: item.countOwned,
              ownerName: null,
            }))
        : [];
    const mine = new Set(fromLocker.map((g) => g.itemId));
    const pooled: PickableGear[] = pool.data.items
      .filter((entry) => !mine.has(entry.itemId))
      .map((entry) => ({
        itemId: entry.itemId,
        name: entry.name,
        kind: entry.kind,
        massG: entry.massG,
        maxCount: Math.min(entry.count, entry.countOwned),
        ownerName: entry.ownerName,
      }))
      .filter((g) => g.maxCount > 0);
    data = { gear: [...fromLocker, ...pooled], leaderLockerHidden: wholeLocker && !callerIsLeader };
  }
  return { data, isPending, error, refetch: () => Promise.all([pool.refetch(), locker.refetch()]) };
};
