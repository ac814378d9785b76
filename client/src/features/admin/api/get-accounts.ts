import type { Account } from '@gramwatt/shared';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';

/** `GET /api/admin/accounts`: every account, for admins. */
export const getAccounts = async (signal?: AbortSignal): Promise<Account[]> =>
  (await api.get<{ accounts: Account[] }>('/admin/accounts', signal)).accounts;

export const getAccountsQueryOptions = () =>
  queryOptions({
    queryKey: ['admin', 'accounts'],
    queryFn: ({ signal }) => getAccounts(signal),
  });

export const useAccounts = () => useQuery(getAccountsQueryOptions());
