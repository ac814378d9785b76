import { lockerCsvColumns } from '@gramwatt/shared';
import { useId, useState } from 'react';
import { Alert } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';
import { isApiError } from '@/lib/api-client';
import { useImportLockerCsv, type ImportMode, type ImportResult } from '../api/import-locker-csv';
import { formatGrams } from '../utils/format';
import { kindLabels } from '../utils/labels';
import { SidePanel } from './side-panel';

export interface ImportDialogProps {
  open: boolean;
  onClose: () => void;
  /** Items in the locker now: what "replace" would remove. */
  currentItemCount: number;
  onImported: (result: ImportResult) => void;
}

const refusedMessage = (error: unknown): string => {
  if (isApiError(error, 413)) return `${error.message} Split the file, or keep it under 1 MB and 2,000 rows.`;
  if (isApiError(error, 415)) return `${error.message} Save the sheet as CSV (UTF-8) and try again.`;
  return error instanceof Error ? error.message : 'The import failed. Try again.';
};

function ColumnsHelp() {
  return (
    <details className="rounded-lg border-2 border-firn-200 bg-firn-50 px-4 py-3 text-sm">
      <summary className="cursor-pointer font-medium text-scree-900">Which columns?</summary>
      <p className="mt-2 text-scree-700">
        One file for every kind, told apart by the <code>kind</code> column; <code>,</code> or <code>;</code> between
        cells, <code>.</code> decimals (or <code>,</code> in a <code>;</code> file). Shares are 0–1. An export of your
        locker is a ready-made template.
      </p>
      <dl className="mt-3 grid max-h-72 grid-cols-[auto_1fr] gap-x-4 gap-y-1.5 overflow-y-auto">
        {lockerCsvColumns.map((column) => (
          <div key={column.name} className="contents">
            <dt>
              <code className="font-semibold text-scree-900">{column.name}</code>
            </dt>
            <dd className="text-scree-700">{column.description}</dd>
          </div>
        ))}
      </dl>
    </details>
  );
}

function Report({ result }: { result: ImportResult }) {
  if (result.report.length === 0) return null;
  return (
    <div className="flex flex-col gap-2">
      <Alert
        tone="error"
        title={`${result.report.length === 1 ? 'One problem' : `${result.report.length} problems`} in the file`}
      >
        Nothing has been imported. Fix these rows and check the file again.
      </Alert>
      <div
        tabIndex={0}
        role="region"
        aria-label="Problems by row"
        className="max-h-80 overflow-auto rounded-lg border-2 border-scree-200"
      >
        <table className="w-full border-collapse text-left text-sm">
          <caption className="sr-only">Problems found in the file, by row and column</caption>
          <thead className="sticky top-0 bg-firn-100 text-scree-700">
            <tr>
              <th scope="col" className="px-3 py-2 font-semibold">
                Row
              </th>
              <th scope="col" className="px-3 py-2 font-semibold">
                Column
              </th>
              <th scope="col" className="px-3 py-2 font-semibold">
                Problem
              </th>
            </tr>
          </thead>
          <tbody className="divide-y divide-firn-200">
            {result.report.map((entry, index) => (
              <tr key={`${entry.row}-${entry.column}-${index}`}>
                <td className="px-3 py-2 tabular-nums">{entry.row}</td>
                <td className="px-3 py-2">{entry.column ? <code>{entry.column}</code> : '—'}</td>
                <td className="px-3 py-2">{entry.message}</td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
    </div>
  );
}

function Preview({ result }: { result: ImportResult }) {
  if (result.preview.length === 0) return null;
  return (
    <div
      tabIndex={0}
      role="region"
      aria-label="Items in the file"
      className="max-h-80 overflow-auto rounded-lg border-2 border-scree-200"
    >
      <table className="w-full border-collapse text-left text-sm">
        <caption className="sr-only">The items the file holds</caption>
        <thead className="sticky top-0 bg-firn-100 text-scree-700">
          <tr>
            <th scope="col" className="px-3 py-2 font-semibold">
              Row
            </th>
            <th scope="col" className="px-3 py-2 font-semibold">
              Name
            </th>
            <th scope="col" className="px-3 py-2 font-semibold">
              Kind
            </th>
            <th scope="col" className="px-3 py-2 text-right font-semibold">
              Owned
            </th>
            <th scope="col" className="px-3 py-2 text-right font-semibold">
              Each
            </th>
          </tr>
        </thead>
        <tbody className="divide-y divide-firn-200">
          {result.preview.map((row) => (
            <tr key={row.row}>
              <td className="px-3 py-2 tabular-nums">{row.row}</td>
              <th scope="row" className="px-3 py-2 font-medium">
                {row.name}
              </th>
              <td className="px-3 py-2">{kindLabels[row.kind]}</td>
              <td className="px-3 py-2 text-right tabular-nums">{row.countOwned}</td>
              <td className="px-3 py-2 text-right tabular-nums">{formatGrams(row.massG)}</td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}

/**
 * CSV import in two steps: check the file (a dry run that writes nothing and reports every bad cell by row and
 * column), then import it, which writes every row or none.
 */
export function ImportDialog({ open, onClose, currentItemCount, onImported }: ImportDialogProps) {
  const fileInputId = useId();
  const [file, setFile] = useState<File | null>(null);
  const [mode, setMode] = useState<ImportMode>('add');
  const [checked, setChecked] = useState<ImportResult | null>(null);
  const [error, setError] = useState<string | null>(null);
  const importCsv = useImportLockerCsv();

  const close = () => {
    setFile(null);
    setChecked(null);
    setError(null);
    setMode('add');
    importCsv.reset();
    onClose();
  };

  const run = (commit: boolean) => {
    if (!file) {
      setError('Choose a CSV file first.');
      return;
    }
    setError(null);
    importCsv.mutate(
      { file, mode, commit },
      {
        onSuccess: (result) => {
          if (commit && result.ok) {
            onImported(result);
            close();
          } else setChecked(result);
        },
        onError: (cause) => setError(refusedMessage(cause)),
      },
    );
  };

  const canImport = checked !== null && checked.ok && checked.report.length === 0 && checked.rowCount > 0;
  const count = checked?.rowCount ?? 0;

  return (
    <SidePanel
      open={open}
      onClose={close}
      title="Import gear from a CSV file"
      description="Check the file first: nothing is written until you import, and then every row is written or none."
    >
      <div className="flex flex-col gap-5 pb-6">
        <ColumnsHelp />
        <div className="flex flex-col gap-1.5">
          <label htmlFor={fileInputId} className="text-sm font-medium text-scree-900">
            CSV file
          </label>
          <input
            id={fileInputId}
            type="file"
            accept=".csv,text/csv,text/plain"
            onChange={(event) => {
              setFile(event.target.files?.[0] ?? null);
              setChecked(null);
              setError(null);
            }}
            className="rounded-lg border-2 border-scree-300 bg-white p-2 text-sm file:mr-3 file:rounded-md file:border-0 file:bg-firn-200 file:px-3 file:py-1.5 file:font-medium file:text-scree-900"
          />
          <p className="text-sm text-scree-600">UTF-8, up to 1 MB and 2,000 rows.</p>
        </div>
        <fieldset className="flex flex-col gap-2">
          <legend className="mb-1 text-sm font-medium text-scree-900">What to do with your locker</legend>
          {(
            [
              ['add', 'Add to my locker', 'The rows join the gear you have.'],
              [
                'replace',
                'Replace my locker',
                `Your ${currentItemCount === 1 ? 'item goes' : `${currentItemCount} items go`}, with their photos and spec sheets; the file's rows take their place.`,
              ],
            ] as const
          ).map(([value, label, hint]) => (
            <label
              key={value}
              className="flex items-start gap-3 rounded-lg border-2 border-scree-200 px-3 py-2.5 has-[:checked]:border-moss-700 has-[:checked]:bg-moss-50"
            >
              <input
                type="radio"
                name="import-mode"
                value={value}
                checked={mode === value}
                onChange={() => {
                  setMode(value);
                  setChecked(null);
                }}
                className="mt-1 size-4 accent-moss-700"
              />
              <span>
                <span className="block font-medium text-scree-900">{label}</span>
                <span className="block text-sm text-scree-600">{hint}</span>
              </span>
            </label>
          ))}
        </fieldset>
        {error && (
          <Alert tone="error" title="File refused">
            {error}
          </Alert>
        )}
        {checked && (
          <div className="flex flex-col gap-3" aria-live="polite">
            {checked.report.length === 0 && checked.rowCount === 0 && (
              <Alert tone="caution" title="No rows">
                The file has a header but no items.
              </Alert>
            )}
            {canImport && (
              <Alert tone="done" title={`${count === 1 ? 'One item' : `${count} items`} ready`}>
                Every row is good.{' '}
                {mode === 'replace'
                  ? 'Importing replaces everything in your locker.'
                  : 'Importing adds them to your locker.'}
              </Alert>
            )}
            <Report result={checked} />
            <Preview result={checked} />
          </div>
        )}
        <div className="sticky bottom-0 -mx-6 flex flex-col-reverse gap-2 border-t-2 border-firn-200 bg-white px-6 py-4 sm:flex-row sm:justify-end">
          <Button variant="secondary" onClick={close}>
            Cancel
          </Button>
          {canImport ? (
            <Button
              variant={mode === 'replace' ? 'danger' : 'primary'}
              isLoading={importCsv.isPending}
              onClick={() => run(true)}
            >
              {mode === 'replace'
                ? `Replace with ${count} item${count === 1 ? '' : 's'}`
                : `Import ${count} item${count === 1 ? '' : 's'}`}
            </Button>
          ) : (
            <Button isLoading={importCsv.isPending} onClick={() => run(false)} disabled={!file}>
              Check the file
            </Button>
          )}
        </div>
      </div>
    </SidePanel>
  );
}
