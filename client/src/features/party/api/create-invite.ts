import type { Invite, InviteCreate } from '@gramwatt/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { partyKeys, tripPath } from './party-keys';

export interface CreateInviteInput {
  tripId: string;
  data: InviteCreate;
}

/**
 * `POST /api/trips/:id/invites` (leader): invites an address as partner or viewer and e-mails the link.
 * Inviting an address again replaces its pending invite (that is how a leader resends). 409: already on the trip.
 */
export const createInvite = async ({ tripId, data }: CreateInviteInput): Promise<Invite> =>
  (await api.post<{ invite: Invite }>(`${tripPath(tripId)}/invites`, data)).invite;

export const useCreateInvite = () => {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createInvite,
    onSuccess: (_i, { tripId }) => queryClient.invalidateQueries({ queryKey: partyKeys.invites(tripId) }),
  });
};
