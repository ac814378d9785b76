import type { ShareLink } from '@gramwatt/shared';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { partyKeys, tripPath } from './party-keys';

/** `GET /api/trips/:id/share` (leader): the read-only link as it stands (`none`, `active`, `revoked`, `expired`). */
export const getShareLink = async (tripId: string, signal?: AbortSignal): Promise<ShareLink> =>
  (await api.get<{ share: ShareLink }>(`${tripPath(tripId)}/share`, signal)).share;

export const getShareLinkQueryOptions = (tripId: string) =>
  queryOptions({ queryKey: partyKeys.shareLink(tripId), queryFn: ({ signal }) => getShareLink(tripId, signal) });

export const useShareLink = (tripId: string, { enabled = true } = {}) =>
  useQuery({ ...getShareLinkQueryOptions(tripId), enabled });
