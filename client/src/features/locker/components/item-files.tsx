import { useId, useState, type ChangeEvent } from 'react';
import { Alert } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';
import { Spinner } from '@/components/ui/spinner';
import { isApiError } from '@/lib/api-client';
import { acceptedTypes, maxUploadBytes, useDeleteLockerFile, useUploadLockerFile } from '../api/locker-files';
import type { LockerFile, LockerFilePurpose, LockerItem } from '../api/types';
import { formatBytes } from '../utils/format';

const purposeLabels: Record<LockerFilePurpose, { add: string; types: string; noun: string }> = {
  photo: { add: 'Add a photo', types: 'JPEG, PNG or WebP', noun: 'photo' },
  'spec-sheet': { add: 'Add a spec sheet', types: 'PDF', noun: 'spec sheet' },
};

/** The server's own words for a refused upload, with what it does take. */
const uploadErrorMessage = (error: unknown, purpose: LockerFilePurpose): string => {
  const { noun, types } = purposeLabels[purpose];
  if (isApiError(error, 413)) return `${error.message} A ${noun} may be at most ${formatBytes(maxUploadBytes)}.`;
  if (isApiError(error, 415)) return `${error.message} A ${noun} must be ${types}.`;
  return error instanceof Error ? error.message : 'The upload failed. Try again.';
};

function UploadButton({
  item,
  purpose,
  onError,
}: {
  item: LockerItem;
  purpose: LockerFilePurpose;
  onError: (message: string | null) => void;
}) {
  const id = useId();
  const upload = useUploadLockerFile();
  const labels = purposeLabels[purpose];

  const onChange = (event: ChangeEvent<HTMLInputElement>) => {
    const file = event.target.files?.[0];
    event.target.value = '';
    if (!file) return;
    onError(null);
    if (file.size > maxUploadBytes) {
      onError(`${file.name} is larger than ${formatBytes(maxUploadBytes)}, the most a ${labels.noun} may be.`);
      return;
    }
    upload.mutate(
      { itemId: item.id, purpose, file },
      { onError: (error) => onError(uploadErrorMessage(error, purpose)) },
    );
  };

  return (
    <div className="flex flex-col gap-1">
      <label
        htmlFor={id}
        className="inline-flex min-h-11 cursor-pointer items-center justify-center gap-2 rounded-lg border-2 border-scree-300 bg-white px-4 font-medium text-scree-900 hover:border-scree-500 hover:bg-firn-100 has-[:focus-visible]:outline-2 has-[:focus-visible]:outline-tarn-600"
      >
        {upload.isPending ? <Spinner size="sm" label={`Uploading the ${labels.noun}`} /> : null}
        {upload.isPending ? `Uploading ${labels.noun}…` : labels.add}
        <input
          id={id}
          type="file"
          accept={acceptedTypes[purpose]}
          disabled={upload.isPending}
          onChange={onChange}
          className="sr-only"
        />
      </label>
      <span className="text-xs text-scree-600">
        {labels.types}, up to {formatBytes(maxUploadBytes)}
      </span>
    </div>
  );
}

function FileRow({ item, file }: { item: LockerItem; file: LockerFile }) {
  const remove = useDeleteLockerFile();
  return (
    <li className="flex items-center gap-3 py-2">
      {file.thumbUrl ? (
        <img src={file.thumbUrl} alt="" className="size-12 rounded-md border border-scree-200 object-cover" />
      ) : (
        <span
          aria-hidden="true"
          className="flex size-12 items-center justify-center rounded-md bg-firn-100 text-xs font-semibold text-scree-600"
        >
          {file.purpose === 'spec-sheet' ? 'PDF' : 'IMG'}
        </span>
      )}
      <div className="min-w-0 flex-1">
        <a
          href={file.url}
          target="_blank"
          rel="noreferrer"
          className="block truncate font-medium text-moss-700 underline underline-offset-2 hover:text-moss-900"
        >
          {file.fileName}
        </a>
        <span className="text-xs text-scree-600">
          {file.purpose === 'photo' ? 'Photo' : 'Spec sheet'} · {formatBytes(file.sizeBytes)}
        </span>
      </div>
      <Button
        variant="quiet"
        size="sm"
        isLoading={remove.isPending}
        onClick={() => remove.mutate({ itemId: item.id, fileId: file.id })}
        aria-label={`Remove ${file.fileName}`}
      >
        Remove
      </Button>
    </li>
  );
}

/** A saved item's photo and spec sheet: what is there, and buttons to add more. */
export function ItemFiles({ item }: { item: LockerItem }) {
  const [error, setError] = useState<string | null>(null);
  return (
    <section aria-labelledby="item-files-heading" className="flex flex-col gap-3 border-t-2 border-firn-200 pt-4">
      <h3 id="item-files-heading" className="text-sm font-semibold tracking-wide text-scree-700 uppercase">
        Photo and spec sheet
      </h3>
      {item.files.length > 0 ? (
        <ul className="divide-y divide-firn-200">
          {item.files.map((file) => (
            <FileRow key={file.id} item={item} file={file} />
          ))}
        </ul>
      ) : (
        <p className="text-sm text-scree-600">No files yet. A photo helps you find the item on the shelf.</p>
      )}
      {error && (
        <Alert tone="error" title="Upload refused">
          {error}
        </Alert>
      )}
      <div className="flex flex-wrap gap-4">
        <UploadButton item={item} purpose="photo" onError={setError} />
        <UploadButton item={item} purpose="spec-sheet" onError={setError} />
      </div>
    </section>
  );
}
