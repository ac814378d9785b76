import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { LockerItemsResponse } from './types';

/** `GET /api/locker/items`: the whole locker; sorting, search and the kind filter happen in the table. */
export const getLockerItems = (signal?: AbortSignal): Promise<LockerItemsResponse> =>
  api.get<LockerItemsResponse>('/locker/items', signal);

export const getLockerItemsQueryOptions = () =>
  queryOptions({
    queryKey: ['locker', 'items'],
    queryFn: ({ signal }) => getLockerItems(signal),
  });

export const useLockerItems = () => useQuery(getLockerItemsQueryOptions());
