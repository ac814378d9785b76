import type { PoolItem, PoolItemUpdate } from '@gramwatt/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { partyKeys, tripPath } from './party-keys';

export interface UpdatePoolItemInput {
  tripId: string;
  poolItemId: string;
  data: PoolItemUpdate;
}

/** `PATCH /api/trips/:id/pool/:poolItemId`: how many are shared (a partner only their own, the leader any). */
export const updatePoolItem = async ({ tripId, poolItemId, data }: UpdatePoolItemInput): Promise<PoolItem> =>
  (await api.patch<{ item: PoolItem }>(`${tripPath(tripId)}/pool/${encodeURIComponent(poolItemId)}`, data)).item;

export const useUpdatePoolItem = () => {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updatePoolItem,
    onSettled: (_i, _e, { tripId }) => queryClient.invalidateQueries({ queryKey: partyKeys.pool(tripId) }),
  });
};
