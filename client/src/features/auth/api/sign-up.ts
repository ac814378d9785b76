import type { Account, SignUpInput } from '@gramwatt/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { getAccountQueryOptions, type AccountResponse } from '@/lib/auth';
import { signIn } from './sign-in';

/** `POST /api/auth/sign-up`: creates a member account. */
export const signUp = async (input: SignUpInput): Promise<Account> =>
  (await api.post<AccountResponse>('/auth/sign-up', input)).account;

/** Signs up, then signs in with the same e-mail and password so the new member lands in the app. */
export const useSignUp = ({ onSuccess }: { onSuccess?: (account: Account) => void } = {}) => {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async (input: SignUpInput) => {
      await signUp(input);
      return signIn({ email: input.email, password: input.password });
    },
    onSuccess: (account) => {
      queryClient.setQueryData(getAccountQueryOptions().queryKey, account);
      onSuccess?.(account);
    },
  });
};
