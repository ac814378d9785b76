import type { MailDelivery } from '@gramwatt/shared';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';

/** `GET /api/admin/mail` (admins): the latest messages' delivery status, newest first — never their content. */
export const getMailDeliveries = async (signal?: AbortSignal): Promise<MailDelivery[]> =>
  (await api.get<{ messages: MailDelivery[] }>('/admin/mail', signal)).messages;

export const getMailDeliveriesQueryOptions = () =>
  queryOptions({ queryKey: ['admin', 'mail'], queryFn: ({ signal }) => getMailDeliveries(signal), staleTime: 0 });

export const useMailDeliveries = () => useQuery(getMailDeliveriesQueryOptions());
