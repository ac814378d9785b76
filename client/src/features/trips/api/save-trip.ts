import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { Trip, TripInputDraft } from '@gramwatt/shared';
import { apiRequest } from '@/lib/api-client';
import { getTripsQueryOptions } from './get-trips';

export interface SaveTripInput {
  /** Present to replace a trip (`PUT`), absent to create one (`POST`). */
  tripId?: string;
  body: TripInputDraft;
}

/** `POST /api/trips` or `PUT /api/trips/:id`; a 400 carries field paths such as `sky.clearShare`. */
export const saveTrip = async ({ tripId, body }: SaveTripInput): Promise<Trip> =>
  (
    await apiRequest<{ trip: Trip }>(tripId ? `/trips/${encodeURIComponent(tripId)}` : '/trips', {
      method: tripId ? 'PUT' : 'POST',
      body: { ...body },
    })
  ).trip;

export const useSaveTrip = () => {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: saveTrip,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: getTripsQueryOptions().queryKey }),
  });
};
