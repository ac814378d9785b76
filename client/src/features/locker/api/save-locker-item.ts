import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRequest } from '@/lib/api-client';
import { tripsQueryKey } from '@/lib/react-query';
import { getLockerItemsQueryOptions } from './get-locker-items';
import type { LockerItem, LockerItemInput } from './types';

export interface SaveLockerItemInput {
  /** Present to change an item (`PUT`), absent to add one (`POST`). */
  itemId?: string;
  body: LockerItemInput;
}

/** `POST /api/locker/items` or `PUT /api/locker/items/:id`; a 400 carries field paths such as `spec.ratedW`. */
export const saveLockerItem = async ({ itemId, body }: SaveLockerItemInput): Promise<LockerItem> =>
  (
    await apiRequest<{ item: LockerItem }>(itemId ? `/locker/items/${encodeURIComponent(itemId)}` : '/locker/items', {
      method: itemId ? 'PUT' : 'POST',
      body: { ...body },
    })
  ).item;

export const useSaveLockerItem = () => {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: saveLockerItem,
    // A device's spec shows (and is judged) on every trip it comes on.
    onSuccess: () =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: getLockerItemsQueryOptions().queryKey }),
        queryClient.invalidateQueries({ queryKey: tripsQueryKey }),
      ]),
  });
};
