import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import type { CheckResult, KitSelection } from '@gramwatt/shared';
import { apiRequest, isApiError } from '@/lib/api-client';
import { tripPath } from './trip-path';

/** `POST /api/trips/:id/check`: simulates a hand-picked kit on the trip; the verdict, ledger and grams it shaves. */
export const checkKit = (tripId: string, kit: KitSelection, signal?: AbortSignal): Promise<CheckResult> =>
  apiRequest<CheckResult>(tripPath(tripId, 'check'), { method: 'POST', body: { kit }, signal });

/** The same kit in any order is the same check: lines sorted by item id, empty lines dropped. */
export const normaliseSelection = (kit: KitSelection): KitSelection =>
  kit.filter((line) => line.count > 0).sort((a, b) => (a.itemId < b.itemId ? -1 : a.itemId > b.itemId ? 1 : 0));

/**
 * A check is a read (the server stores nothing), so it is a query keyed by the kit: going back to a kit tried a
 * moment ago answers from the cache. A busy planner (503) is not retried at once: the tab says when to try again.
 */
export const getCheckKitQueryOptions = (tripId: string, kit: KitSelection) => {
  const lines = normaliseSelection(kit);
  return queryOptions({
    queryKey: ['trips', tripId, 'check', lines],
    queryFn: ({ signal }) => checkKit(tripId, lines, signal),
    staleTime: 5 * 60_000,
    // Only a dropped connection is worth a quick retry; a 4xx or a busy planner will answer the same at once.
    retry: (failureCount, error) => failureCount < 2 && isApiError(error, 0),
  });
};

/** The check of `kit`, keeping the last answer on screen while the next one is on its way. */
export const useCheckKit = (tripId: string, kit: KitSelection) =>
  useQuery({
    ...getCheckKitQueryOptions(tripId, kit),
    enabled: normaliseSelection(kit).length > 0,
    placeholderData: keepPreviousData,
  });
