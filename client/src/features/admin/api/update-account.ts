import type { Account, AccountUpdateInput } from '@gramwatt/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { getAccountQueryOptions } from '@/lib/auth';
import { getAccountsQueryOptions } from './get-accounts';

export interface UpdateAccountInput {
  accountId: string;
  data: AccountUpdateInput;
}

/** `PATCH /api/admin/accounts/:id`: change a role, or disable / enable an account. 409 when it would leave no admin. */
export const updateAccount = async ({ accountId, data }: UpdateAccountInput): Promise<Account> =>
  (await api.patch<{ account: Account }>(`/admin/accounts/${encodeURIComponent(accountId)}`, data)).account;

export const useUpdateAccount = () => {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateAccount,
    // Refetch on failure too: a 409 means the table shows a state the server refused.
    onSettled: (_account, _error, { accountId }) => {
      void queryClient.invalidateQueries({ queryKey: getAccountsQueryOptions().queryKey });
      // An admin who changes their own account must see their new role (and navigation) at once.
      const me = queryClient.getQueryData(getAccountQueryOptions().queryKey);
      if (me?.id === accountId) void queryClient.invalidateQueries({ queryKey: getAccountQueryOptions().queryKey });
    },
  });
};
