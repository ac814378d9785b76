import type { TripMember } from '@gramwatt/shared';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { partyKeys, tripPath } from './party-keys';

/** `GET /api/trips/:id/members`: everyone on the trip with their role and gram limit (any member may read). */
export const getMembers = async (tripId: string, signal?: AbortSignal): Promise<TripMember[]> =>
  (await api.get<{ members: TripMember[] }>(`${tripPath(tripId)}/members`, signal)).members;

export const getMembersQueryOptions = (tripId: string) =>
  queryOptions({ queryKey: partyKeys.members(tripId), queryFn: ({ signal }) => getMembers(tripId, signal) });

export const useMembers = (tripId: string) => useQuery(getMembersQueryOptions(tripId));
