import type { ShareCreate, ShareLink } from '@gramwatt/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { partyKeys, tripPath } from './party-keys';

export interface CreateShareLinkInput {
  tripId: string;
  data: ShareCreate;
}

/** `POST /api/trips/:id/share` (leader): a new signed, expiring read-only link; every earlier link stops working. */
export const createShareLink = async ({ tripId, data }: CreateShareLinkInput): Promise<ShareLink> =>
  (await api.post<{ share: ShareLink }>(`${tripPath(tripId)}/share`, data)).share;

export const useCreateShareLink = () => {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createShareLink,
    onSuccess: (share, { tripId }) => queryClient.setQueryData(partyKeys.shareLink(tripId), share),
  });
};
