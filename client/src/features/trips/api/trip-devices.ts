import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { TripDeviceDetail, UseProfileOverride } from '@gramwatt/shared';
import { api } from '@/lib/api-client';
import { getTripQueryOptions } from './get-trip';

const devicesPath = (tripId: string) => `/trips/${encodeURIComponent(tripId)}/devices`;

/** `POST /api/trips/:id/devices`: one of the caller's locker devices. */
export const addTripDevice = async ({ tripId, itemId }: { tripId: string; itemId: string }) =>
  (await api.post<{ device: TripDeviceDetail }>(devicesPath(tripId), { itemId })).device;

/** `PATCH /api/trips/:id/devices/:deviceId`: `null` resets to the locker default. */
export const updateTripDevice = async ({
  tripId,
  deviceId,
  useProfileOverride,
}: {
  tripId: string;
  deviceId: string;
  useProfileOverride: UseProfileOverride | null;
}) =>
  (
    await api.patch<{ device: TripDeviceDetail }>(`${devicesPath(tripId)}/${encodeURIComponent(deviceId)}`, {
      useProfileOverride,
    })
  ).device;

/** `DELETE /api/trips/:id/devices/:deviceId`. */
export const removeTripDevice = ({ tripId, deviceId }: { tripId: string; deviceId: string }) =>
  api.delete<void>(`${devicesPath(tripId)}/${encodeURIComponent(deviceId)}`);

const useTripDeviceMutation = <V extends { tripId: string }, R>(fn: (v: V) => Promise<R>) => {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: fn,
    onSuccess: (_r, v) => queryClient.invalidateQueries({ queryKey: getTripQueryOptions(v.tripId).queryKey }),
  });
};

export const useAddTripDevice = () => useTripDeviceMutation(addTripDevice);
export const useUpdateTripDevice = () => useTripDeviceMutation(updateTripDevice);
export const useRemoveTripDevice = () => useTripDeviceMutation(removeTripDevice);
