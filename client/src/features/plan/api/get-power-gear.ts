import { queryOptions, useQuery } from '@tanstack/react-query';
import type { LockerItem, LockerItemListResponse } from '@gramwatt/shared';
import { api } from '@/lib/api-client';

/** `GET /api/locker/items` (the locker screen's cache entry), for picking a kit by hand. */
export const getLockerItemsQueryOptions = () =>
  queryOptions({
    queryKey: ['locker', 'items'],
    queryFn: ({ signal }) => api.get<LockerItemListResponse>('/locker/items', signal),
  });

/** The power gear of the signed-in member's locker: everything but devices, which are carried anyway. */
export const usePowerGear = () =>
  useQuery({
    ...getLockerItemsQueryOptions(),
    select: (data): LockerItem[] => data.items.filter((item) => item.kind !== 'device'),
  });
