import type { OutboxEntry } from '@gramwatt/shared';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';

/** `GET /api/outbox`: messages delivered to the signed-in account's address, newest first (404 with real SMTP). */
export const getOutbox = async (signal?: AbortSignal): Promise<OutboxEntry[]> =>
  (await api.get<{ messages: OutboxEntry[] }>('/outbox', signal)).messages;

export const getOutboxQueryOptions = () =>
  queryOptions({
    queryKey: ['outbox', 'messages'],
    queryFn: ({ signal }) => getOutbox(signal),
    // A demo invite arrives a moment after the leader sends it.
    staleTime: 0,
  });

export const useOutbox = () => useQuery(getOutboxQueryOptions());
