import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { partyKeys, tripPath } from './party-keys';

export interface WithdrawInviteInput {
  tripId: string;
  inviteId: string;
}

/** `DELETE /api/trips/:id/invites/:inviteId` (leader): the invite's link stops working. 409 once accepted. */
export const withdrawInvite = ({ tripId, inviteId }: WithdrawInviteInput): Promise<void> =>
  api.delete<void>(`${tripPath(tripId)}/invites/${encodeURIComponent(inviteId)}`);

export const useWithdrawInvite = () => {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: withdrawInvite,
    onSettled: (_r, _e, { tripId }) => queryClient.invalidateQueries({ queryKey: partyKeys.invites(tripId) }),
  });
};
