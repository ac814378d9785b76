import { queryOptions, useQuery } from '@tanstack/react-query';
import type { ChosenKit } from '@gramwatt/shared';
import { api } from '@/lib/api-client';
import { tripPath } from './trip-path';

/** `GET /api/trips/:id/kit`: the trip's chosen kit (what the packing list uses), or null before one is chosen. */
export const getChosenKit = async (tripId: string, signal?: AbortSignal): Promise<ChosenKit | null> =>
  (await api.get<{ kit: ChosenKit | null }>(tripPath(tripId, 'kit'), signal)).kit;

export const getChosenKitQueryOptions = (tripId: string) =>
  queryOptions({ queryKey: ['trips', tripId, 'kit'], queryFn: ({ signal }) => getChosenKit(tripId, signal) });

export const useChosenKit = (tripId: string) => useQuery(getChosenKitQueryOptions(tripId));
