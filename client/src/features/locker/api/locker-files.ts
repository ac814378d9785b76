import { lockerFileContentTypes, maxLockerFileBytes } from '@gramwatt/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { getLockerItemsQueryOptions } from './get-locker-items';
import { postFormData } from './post-form-data';
import type { LockerFile, LockerFilePurpose } from './types';

/** The largest photo or spec sheet the server takes; checked here first to save a wasted upload. */
export const maxUploadBytes = maxLockerFileBytes;

/** The file picker's `accept` per purpose (the server checks the bytes themselves, not only the name). */
export const acceptedTypes: Record<LockerFilePurpose, string> = {
  photo: lockerFileContentTypes.photo.join(','),
  'spec-sheet': lockerFileContentTypes['spec-sheet'].join(','),
};

const filesPath = (itemId: string) => `/locker/items/${encodeURIComponent(itemId)}/files`;

export interface UploadLockerFileInput {
  itemId: string;
  purpose: LockerFilePurpose;
  file: File;
}

/** `POST /api/locker/items/:id/files` (multipart `file` + `purpose`) → 201 `{ file }`; 413 too large, 415 wrong type. */
export const uploadLockerFile = async ({ itemId, purpose, file }: UploadLockerFileInput): Promise<LockerFile> => {
  const formData = new FormData();
  formData.append('purpose', purpose);
  formData.append('file', file, file.name);
  return (await postFormData<{ file: LockerFile }>(filesPath(itemId), formData)).file;
};

/** `DELETE /api/locker/items/:id/files/:fileId` (204). */
export const deleteLockerFile = ({ itemId, fileId }: { itemId: string; fileId: string }): Promise<void> =>
  api.delete<void>(`${filesPath(itemId)}/${encodeURIComponent(fileId)}`);

export const useUploadLockerFile = () => {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: uploadLockerFile,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: getLockerItemsQueryOptions().queryKey }),
  });
};

export const useDeleteLockerFile = () => {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: deleteLockerFile,
    onSettled: () => queryClient.invalidateQueries({ queryKey: getLockerItemsQueryOptions().queryKey }),
  });
};
