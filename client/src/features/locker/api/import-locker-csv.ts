import type { ItemKind } from '@gramwatt/shared';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { getLockerItemsQueryOptions } from './get-locker-items';
import { FormDataError, postFormData } from './post-form-data';

/** "add": the rows join the locker; "replace": the locker becomes exactly the file's rows. */
export type ImportMode = 'add' | 'replace';

/** One problem in the file: `row` counts the header as row 1, `column` is empty for a problem with the whole row. */
export interface ImportReportEntry {
  row: number;
  column: string;
  message: string;
}

export interface ImportPreviewRow {
  row: number;
  kind: ItemKind;
  name: string;
  countOwned: number;
  massG: number;
}

/** `POST /api/locker/import`: with `commit=false` a dry run that writes nothing. */
export interface ImportResult {
  ok: boolean;
  mode: ImportMode;
  rowCount: number;
  report: ImportReportEntry[];
  preview: ImportPreviewRow[];
}

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
  formData.append('file', file);
  try {
    return await postFormData<ImportResult>(`/locker/import?mode=${mode}&commit=${commit}`, formData);
  } catch (error) {
    if (error instanceof FormDataError && error.statusCode === 400 && isImportResult(error.body))
      return { ...error.body, ok: false };
    throw error;
  }
};

export const useImportLockerCsv = () => {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: importLockerCsv,
    onSuccess: (_result, { commit }) => {
      if (commit) void queryClient.invalidateQueries({ queryKey: getLockerItemsQueryOptions().queryKey });
    },
  });
};
