import type { ReactNode } from 'react';
import { Alert } from '@/components/ui/alert';
import { Spinner } from '@/components/ui/spinner';

/** A tab's data loading: a spinner that says what it waits for. */
export function TabLoading({ label }: { label: string }) {
  return (
    <div className="flex min-h-32 items-center justify-center text-moss-700">
      <Spinner size="lg" label={label} />
    </div>
  );
}

/** A tab's data failed: what failed, the server's words, and a way to try again. */
export function TabError({ title, error, retry }: { title: string; error: Error; retry?: ReactNode }) {
  return (
    <Alert tone="error" title={title}>
      <p>{error.message}</p>
      {retry && <div className="mt-2">{retry}</div>}
    </Alert>
  );
}
