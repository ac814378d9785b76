import { useMutation, useQueryClient } from '@tanstack/react-query';
import { env } from '@/config/env';
import { api } from '@/lib/api-client';
import { tripsQueryKey } from '@/lib/react-query';
import { getLockerItemsQueryOptions } from './get-locker-items';

const itemPath = (itemId: string) => `/locker/items/${encodeURIComponent(itemId)}`;

/** `DELETE /api/locker/items/:id` (204); the item's files go with it. */
export const deleteLockerItem = (itemId: string): Promise<void> => api.delete<void>(itemPath(itemId));

/**
 * The same DELETE for a page that is being closed: `keepalive` lets the request outlive the page, so a delete
 * the member was shown as done is not lost when they close the tab inside the undo window.
 */
export const deleteLockerItemOnUnload = (itemId: string): void => {
  void fetch(new URL(`${env.apiUrl}${itemPath(itemId)}`, window.location.origin), {
    method: 'DELETE',
    credentials: 'include',
    keepalive: true,
  }).catch(() => undefined);
};

export const useDeleteLockerItem = () => {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: deleteLockerItem,
    // A deleted device leaves every trip it came on.
    onSettled: () =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: getLockerItemsQueryOptions().queryKey }),
        queryClient.invalidateQueries({ queryKey: tripsQueryKey }),
      ]),
  });
};
