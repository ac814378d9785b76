import type { LockerItem, LockerItemResponse } from '@gramwatt/shared';
import { useMutation } from '@tanstack/react-query';
import { api } from '@/lib/api-client';

/** `POST /api/catalogue/:id/copy` → 201 `{ item }`: a new locker item for the caller, count owned 1. */
export const copyCatalogueEntry = async (entryId: string): Promise<LockerItem> =>
  (await api.post<LockerItemResponse>(`/catalogue/${encodeURIComponent(entryId)}/copy`)).item;

/** `onCopied` lets the page refresh the locker, which is another feature's data. */
export const useCopyCatalogueEntry = ({ onCopied }: { onCopied?: (item: LockerItem) => void } = {}) =>
  useMutation({ mutationFn: copyCatalogueEntry, onSuccess: (item) => onCopied?.(item) });
