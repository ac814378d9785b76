import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { partyKeys, tripPath } from './party-keys';

/** `DELETE /api/trips/:id/share` (leader): the link stops working at once. */
export const revokeShareLink = ({ tripId }: { tripId: string }): Promise<void> =>
  api.delete<void>(`${tripPath(tripId)}/share`);

export const useRevokeShareLink = () => {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: revokeShareLink,
    onSettled: (_r, _e, { tripId }) => queryClient.invalidateQueries({ queryKey: partyKeys.shareLink(tripId) }),
  });
};
