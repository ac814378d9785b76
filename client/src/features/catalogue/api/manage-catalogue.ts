import type { CatalogueEntry, CatalogueEntryInput, CatalogueEntryResponse } from '@gramwatt/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api, apiRequest } from '@/lib/api-client';
import { getCatalogueQueryOptions } from './get-catalogue';

export interface SaveCatalogueEntryInput {
  /** Present to change an entry (`PUT`), absent to add one (`POST`). */
  entryId?: string;
  body: CatalogueEntryInput;
}

/** `POST /api/catalogue` or `PUT /api/catalogue/:id` (admins; 403 for members; 400 with field paths). */
export const saveCatalogueEntry = async ({ entryId, body }: SaveCatalogueEntryInput): Promise<CatalogueEntry> =>
  (
    await apiRequest<CatalogueEntryResponse>(entryId ? `/catalogue/${encodeURIComponent(entryId)}` : '/catalogue', {
      method: entryId ? 'PUT' : 'POST',
      body: { ...body },
    })
  ).entry;

/** `DELETE /api/catalogue/:id` (204; admins). Items members already copied stay in their lockers. */
export const deleteCatalogueEntry = (entryId: string): Promise<void> =>
  api.delete<void>(`/catalogue/${encodeURIComponent(entryId)}`);

export const useSaveCatalogueEntry = () => {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: saveCatalogueEntry,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: getCatalogueQueryOptions().queryKey }),
  });
};

export const useDeleteCatalogueEntry = () => {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: deleteCatalogueEntry,
    onSettled: () => queryClient.invalidateQueries({ queryKey: getCatalogueQueryOptions().queryKey }),
  });
};
