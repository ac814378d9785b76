import type { Invite } from '@gramwatt/shared';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { partyKeys, tripPath } from './party-keys';

/** `GET /api/trips/:id/invites` (leader): every invite, newest first, with its state and the e-mail's delivery. */
export const getInvites = async (tripId: string, signal?: AbortSignal): Promise<Invite[]> =>
  (await api.get<{ invites: Invite[] }>(`${tripPath(tripId)}/invites`, signal)).invites;

export const getInvitesQueryOptions = (tripId: string) =>
  queryOptions({ queryKey: partyKeys.invites(tripId), queryFn: ({ signal }) => getInvites(tripId, signal) });

export const useInvites = (tripId: string, { enabled = true } = {}) =>
  useQuery({ ...getInvitesQueryOptions(tripId), enabled });
