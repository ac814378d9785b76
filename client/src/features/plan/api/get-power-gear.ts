import { queryOptions } from '@tanstack/react-query';
import type { LockerItemListResponse } from '@gramwatt/shared';
import { api } from '@/lib/api-client';

/** `GET /api/locker/items` (the locker screen's cache entry), for picking a kit by hand. */
export const getLockerItemsQueryOptions = () =>
  queryOptions({
    queryKey: ['locker', 'items'],
    queryFn: ({ signal }) => api.get<LockerItemListResponse>('/locker/items', signal),
  });
