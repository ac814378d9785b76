import type { OutboxStatus } from '@gramwatt/shared';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';

/** `GET /api/outbox/status`: whether mail goes to the local fake, so the outbox can be read (and linked to). */
export const getOutboxStatus = (signal?: AbortSignal): Promise<OutboxStatus> =>
  api.get<OutboxStatus>('/outbox/status', signal);

export const getOutboxStatusQueryOptions = () =>
  queryOptions({
    queryKey: ['outbox', 'status'],
    queryFn: ({ signal }) => getOutboxStatus(signal),
    // The mail transport is fixed when the server starts.
    staleTime: Number.POSITIVE_INFINITY,
  });

/** True only once the server has said mail stays local; false while asking or after an error. */
export const useOutboxIsLocal = (): boolean => useQuery(getOutboxStatusQueryOptions()).data?.local === true;
