import type { InviteAccepted } from '@gramwatt/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { partyKeys } from './party-keys';

/**
 * `POST /api/invites/:token/accept` (signed in with the invited address): joins the trip with the invite's role.
 * 403 another address; 409 already on the trip; 404 / 410 as for the preview.
 */
export const acceptInvite = ({ token }: { token: string }): Promise<InviteAccepted> =>
  api.post<InviteAccepted>(`/invites/${encodeURIComponent(token)}/accept`);

export const useAcceptInvite = () => {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: acceptInvite,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: partyKeys.tripList() }),
  });
};
