import type { CatalogueEntry, CatalogueListResponse } from '@gramwatt/shared';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';

/** `GET /api/catalogue`: every reference entry (any signed-in account may read it). */
export const getCatalogue = async (signal?: AbortSignal): Promise<CatalogueEntry[]> =>
  (await api.get<CatalogueListResponse>('/catalogue', signal)).entries;

export const getCatalogueQueryOptions = () =>
  queryOptions({
    queryKey: ['catalogue', 'entries'],
    queryFn: ({ signal }) => getCatalogue(signal),
  });

export const useCatalogue = () => useQuery(getCatalogueQueryOptions());
