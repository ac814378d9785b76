import type { Account, SignInInput } from '@gramwatt/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { getAccountQueryOptions, type AccountResponse } from '@/lib/auth';

/** `POST /api/auth/sign-in`: the server sets the session cookie and answers with the account. */
export const signIn = async (input: SignInInput): Promise<Account> =>
  (await api.post<AccountResponse>('/auth/sign-in', input)).account;

export const useSignIn = ({ onSuccess }: { onSuccess?: (account: Account) => void } = {}) => {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: signIn,
    onSuccess: (account) => {
      queryClient.setQueryData(getAccountQueryOptions().queryKey, account);
      onSuccess?.(account);
    },
  });
};
