import type { Account, AccountRole } from '@gramwatt/shared';
import { queryOptions, useMutation, useQuery, useQueryClient, type QueryClient } from '@tanstack/react-query';
import { data, redirect } from 'react-router-dom';
import { paths, safeRedirect } from '@/config/paths';
import { api, isApiError } from './api-client';
import { accountQueryKey } from './react-query';

export interface AccountResponse {
  account: Account;
}

/** The signed-in account, or `null` when nobody is signed in (the API answers 401). */
export const getAccount = async (signal?: AbortSignal): Promise<Account | null> => {
  try {
    const { account } = await api.get<AccountResponse>('/auth/me', signal);
    return account;
  } catch (error) {
    if (isApiError(error, 401)) return null;
    throw error;
  }
};

export const getAccountQueryOptions = () =>
  queryOptions({
    queryKey: accountQueryKey,
    queryFn: ({ signal }) => getAccount(signal),
    staleTime: 5 * 60_000,
  });

/** The signed-in account query: `data` is the account, or `null` when signed out. */
export const useAccount = () => useQuery(getAccountQueryOptions());

const returnPath = (request: Request): string => {
  const url = new URL(request.url);
  return `${url.pathname}${url.search}`;
};

/**
 * Route-loader guard: resolves to the signed-in account, or redirects to sign-in with a way back.
 * @example loader: ({ request }) => requireAccount(queryClient, request)
 */
export const requireAccount = async (queryClient: QueryClient, request: Request): Promise<Account> => {
  const account = await queryClient.ensureQueryData(getAccountQueryOptions());
  if (!account) throw redirect(paths.auth.signIn.getHref(returnPath(request)));
  return account;
};

/** Route-loader guard for a role: a signed-in account without it gets a 403 page, not a redirect. */
export const requireRole = async (queryClient: QueryClient, request: Request, role: AccountRole): Promise<Account> => {
  const account = await requireAccount(queryClient, request);
  if (account.role !== role) throw data({ message: 'This page is for admins.' }, { status: 403 });
  return account;
};

/** Route-loader guard for the sign-in and sign-up pages: someone already signed in goes on to the app. */
export const redirectIfSignedIn = async (queryClient: QueryClient, request: Request): Promise<null> => {
  const account = await queryClient.ensureQueryData(getAccountQueryOptions());
  if (account) throw redirect(safeRedirect(new URL(request.url).searchParams.get('redirectTo')));
  return null;
};

export const signOut = (): Promise<void> => api.post<void>('/auth/sign-out');

/** Signs out, then forgets every cached answer so the next account starts clean. */
export const useSignOut = ({ onSuccess }: { onSuccess?: () => void } = {}) => {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: signOut,
    onSuccess: () => {
      queryClient.setQueryData(getAccountQueryOptions().queryKey, null);
      queryClient.removeQueries({ predicate: (query) => query.queryKey[0] !== accountQueryKey[0] });
      onSuccess?.();
    },
  });
};
