import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { partyKeys, tripPath } from './party-keys';

export interface RemovePoolItemInput {
  tripId: string;
  poolItemId: string;
}

/** `DELETE /api/trips/:id/pool/:poolItemId`: out of the pool; the locker item stays. */
export const removePoolItem = ({ tripId, poolItemId }: RemovePoolItemInput): Promise<void> =>
  api.delete<void>(`${tripPath(tripId)}/pool/${encodeURIComponent(poolItemId)}`);

export const useRemovePoolItem = () => {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: removePoolItem,
    onSettled: (_r, _e, { tripId }) => queryClient.invalidateQueries({ queryKey: partyKeys.pool(tripId) }),
  });
};
