import type { MemberUpdate, TripMember } from '@gramwatt/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { partyKeys, tripPath } from './party-keys';

export interface UpdateMemberInput {
  tripId: string;
  accountId: string;
  data: MemberUpdate;
}

/** `PATCH /api/trips/:id/members/:accountId` (leader): a member's role and/or gram limit; `gramLimitG: null` clears it. */
export const updateMember = async ({ tripId, accountId, data }: UpdateMemberInput): Promise<TripMember> =>
  (await api.patch<{ member: TripMember }>(`${tripPath(tripId)}/members/${encodeURIComponent(accountId)}`, data))
    .member;

export const useUpdateMember = () => {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateMember,
    // Refetch on failure too, so the row shows what the server kept.
    onSettled: (_m, _e, { tripId }) => queryClient.invalidateQueries({ queryKey: partyKeys.trip(tripId) }),
  });
};
