import type { SendHome, SendHomeResult } from '@gramwatt/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { partyKeys, tripPath } from './party-keys';

export interface SendPlanHomeInput {
  tripId: string;
  data: SendHome;
}

/**
 * `POST /api/trips/:id/send-home` (leader): e-mails every viewer the trip summary and the read-only link
 * (made now when there is no working one). 422 when the trip has no viewers.
 */
export const sendPlanHome = ({ tripId, data }: SendPlanHomeInput): Promise<SendHomeResult> =>
  api.post<SendHomeResult>(`${tripPath(tripId)}/send-home`, data);

export const useSendPlanHome = () => {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: sendPlanHome,
    onSuccess: (result, { tripId }) => queryClient.setQueryData(partyKeys.shareLink(tripId), result.share),
  });
};
