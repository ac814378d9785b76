import type { LockerImportIssue, LockerImportMode, LockerImportPreviewRow, LockerImportResult } from '@gramwatt/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { tripsQueryKey } from '@/lib/react-query';
import { getLockerItemsQueryOptions } from './get-locker-items';
import { FormDataError, postFormData } from './post-form-data';

/** "add": the rows join the locker; "replace": the locker becomes exactly the file's rows. */
export type ImportMode = LockerImportMode;
/** One problem in the file: `row` counts the header as row 1, `column` is empty for the whole row or file. */
export type ImportReportEntry = LockerImportIssue;
export type ImportPreviewRow = LockerImportPreviewRow;
/** `POST /api/locker/import`: with `commit=false` a dry run that writes nothing. */
export type ImportResult = LockerImportResult;

export interface ImportLockerCsvInput {
  file: File;
  mode: ImportMode;
  commit: boolean;
}

const isImportResult = (body: unknown): body is ImportResult =>
  !!body && typeof body === 'object' && Array.isArray((body as { report?: unknown }).report);

/**
 * Sends the CSV. A 400 that carries a report (a bad row found while committing) is returned as a result with
 * `ok: false`, like the dry run's; any other failure (413, 415, …) is thrown.
 */
export const importLockerCsv = async ({ file, mode, commit }: ImportLockerCsvInput): Promise<ImportResult> => {
  const formData = new FormData();
  formData.append('file', file, file.name);
  try {
    return await postFormData<ImportResult>(`/locker/import?mode=${mode}&commit=${commit}`, formData);
  } catch (error) {
    if (error instanceof FormDataError && error.statusCode === 400 && isImportResult(error.body))
      return { ...error.body, ok: false, committed: false };
    throw error;
  }
};

export const useImportLockerCsv = () => {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: importLockerCsv,
    onSuccess: (_result, { commit }) => {
      if (!commit) return;
      void queryClient.invalidateQueries({ queryKey: getLockerItemsQueryOptions().queryKey });
      // A replaced locker takes its devices off their trips.
      void queryClient.invalidateQueries({ queryKey: tripsQueryKey });
    },
  });
};
