import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { partyKeys, tripPath } from './party-keys';

export interface RemoveMemberInput {
  tripId: string;
  accountId: string;
}

/** `DELETE /api/trips/:id/members/:accountId` (leader): the member leaves with the devices they brought. */
export const removeMember = ({ tripId, accountId }: RemoveMemberInput): Promise<void> =>
  api.delete<void>(`${tripPath(tripId)}/members/${encodeURIComponent(accountId)}`);

export const useRemoveMember = () => {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: removeMember,
    onSuccess: (_r, { tripId }) =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: partyKeys.trip(tripId) }),
        queryClient.invalidateQueries({ queryKey: partyKeys.tripList(), exact: true }),
      ]),
  });
};
