import { MutationCache, QueryCache, QueryClient, type DefaultOptions } from '@tanstack/react-query';
import { isApiError } from './api-client';

export const queryConfig = {
  queries: {
    refetchOnWindowFocus: false,
    staleTime: 60_000,
    // A 4xx will not change on retry; a network blip or a 5xx might.
    retry: (failureCount, error) =>
      !(isApiError(error) && error.statusCode >= 400 && error.statusCode < 500) && failureCount < 2,
  },
} satisfies DefaultOptions;

/**
 * Prefix of every trip query (the list and each trip). Trips carry their devices' locker specs, so a change in the
 * locker invalidates them too; the key lives here because features do not import each other.
 */
export const tripsQueryKey = ['trips'] as const;

/** Key of the signed-in account query; lives here so a 401 anywhere can clear it without an import cycle. */
export const accountQueryKey = ['auth', 'me'] as const;

/**
 * The app's query client. A 401 from any request means the session ended (signed out elsewhere, expired,
 * or the account was disabled), so the cached account is cleared and the protected layout sends the user to sign in.
 */
export const createQueryClient = (defaultOptions: DefaultOptions = queryConfig): QueryClient => {
  const onError = (error: unknown) => {
    if (isApiError(error, 401)) client.setQueryData(accountQueryKey, null);
  };
  const client: QueryClient = new QueryClient({
    defaultOptions,
    queryCache: new QueryCache({ onError }),
    mutationCache: new MutationCache({ onError }),
  });
  return client;
};
