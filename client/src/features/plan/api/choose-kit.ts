import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { ChooseKitRequest, ChosenKit } from '@gramwatt/shared';
import { api } from '@/lib/api-client';
import { getChosenKitQueryOptions } from './get-chosen-kit';
import { tripPath } from './trip-path';

export interface ChooseKitInput {
  tripId: string;
  body: ChooseKitRequest;
}

/** `PUT /api/trips/:id/kit`: stores the trip's chosen kit — a swap, a hand-picked kit or the optimum (leader only). */
export const chooseKit = async ({ tripId, body }: ChooseKitInput): Promise<ChosenKit> =>
  (await api.put<{ kit: ChosenKit }>(tripPath(tripId, 'kit'), { ...body })).kit;

export const useChooseKit = () => {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: chooseKit,
    onSuccess: (kit, { tripId }) => queryClient.setQueryData(getChosenKitQueryOptions(tripId).queryKey, kit),
  });
};
