import { poolItemSchema, type LockerItem, type LockerItemListResponse } from '@gramwatt/shared';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';

/** Kinds of locker item the pool takes: power gear (devices go on the trip's device list). */
export const poolableKinds: readonly string[] = poolItemSchema.shape.kind.options;

/** `GET /api/locker/items` (the same cache entry as the locker screen's), kept to the gear that can be pooled. */
export const getMyLockerQueryOptions = () =>
  queryOptions({
    queryKey: ['locker', 'items'],
    queryFn: ({ signal }) => api.get<LockerItemListResponse>('/locker/items', signal),
  });

export const useMyPowerGear = ({ enabled = true } = {}) =>
  useQuery({
    ...getMyLockerQueryOptions(),
    enabled,
    select: (data): LockerItem[] => data.items.filter((item) => poolableKinds.includes(item.kind)),
  });
