import type { PoolItem, PoolItemAddInput } from '@gramwatt/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { partyKeys, tripPath } from './party-keys';

export interface ShareToPoolInput {
  tripId: string;
  data: PoolItemAddInput;
}

/** `POST /api/trips/:id/pool` (leader, partner): one of the caller's panels, banks, converters or leads, with a count. */
export const shareToPool = async ({ tripId, data }: ShareToPoolInput): Promise<PoolItem> =>
  (await api.post<{ item: PoolItem }>(`${tripPath(tripId)}/pool`, data)).item;

export const useShareToPool = () => {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: shareToPool,
    onSettled: (_i, _e, { tripId }) => queryClient.invalidateQueries({ queryKey: partyKeys.pool(tripId) }),
  });
};
