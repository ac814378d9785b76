import type { OutboxMessage } from '@gramwatt/shared';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';

/** `GET /api/outbox/:messageId`: one of the caller's messages with its text and HTML parts. */
export const getOutboxMessage = async (messageId: string, signal?: AbortSignal): Promise<OutboxMessage> =>
  (await api.get<{ message: OutboxMessage }>(`/outbox/${encodeURIComponent(messageId)}`, signal)).message;

export const getOutboxMessageQueryOptions = (messageId: string) =>
  queryOptions({
    queryKey: ['outbox', 'messages', messageId],
    queryFn: ({ signal }) => getOutboxMessage(messageId, signal),
  });

export const useOutboxMessage = (messageId: string | null) =>
  useQuery({ ...getOutboxMessageQueryOptions(messageId ?? ''), enabled: messageId !== null });
