import type { InvitePreview } from '@gramwatt/shared';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';

/** `GET /api/invites/:token` (no account needed): trip name, role, who invited. 404 unknown; 410 used, withdrawn, expired. */
export const getInvitePreview = async (token: string, signal?: AbortSignal): Promise<InvitePreview> =>
  (await api.get<{ invite: InvitePreview }>(`/invites/${encodeURIComponent(token)}`, signal)).invite;

export const getInvitePreviewQueryOptions = (token: string) =>
  queryOptions({
    queryKey: ['invites', token],
    queryFn: ({ signal }) => getInvitePreview(token, signal),
    // An invite's state changes when it is used; do not show a stale "still open".
    staleTime: 0,
  });

export const useInvitePreview = (token: string) => useQuery(getInvitePreviewQueryOptions(token));
