import type { Account, SignUpInput } from '@gramwatt/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { getAccountQueryOptions, type AccountResponse } from '@/lib/auth';

/** `POST /api/auth/sign-up`: creates a member account and starts its session (the server sets the cookie). */
export const signUp = async (input: SignUpInput): Promise<Account> =>
  (await api.post<AccountResponse>('/auth/sign-up', input)).account;

/** Signs up; the new member is signed in at once. */
export const useSignUp = ({ onSuccess }: { onSuccess?: (account: Account) => void } = {}) => {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: signUp,
    onSuccess: (account) => {
      queryClient.setQueryData(getAccountQueryOptions().queryKey, account);
      onSuccess?.(account);
    },
  });
};
