import { queryOptions, useQuery } from '@tanstack/react-query';
import type { LockerItemListResponse } from '@gramwatt/shared';
import { api } from '@/lib/api-client';

/** `GET /api/locker/items`, kept to the devices (the same cache entry as the locker screen's). */
export const getLockerDevicesQueryOptions = () =>
  queryOptions({
    queryKey: ['locker', 'items'],
    queryFn: ({ signal }) => api.get<LockerItemListResponse>('/locker/items', signal),
  });

export const useLockerDevices = () =>
  useQuery({
    ...getLockerDevicesQueryOptions(),
    select: (data) => data.items.filter((item) => item.kind === 'device'),
  });
