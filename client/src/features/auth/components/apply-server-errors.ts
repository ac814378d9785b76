import type { FieldValues, Path, UseFormSetError } from 'react-hook-form';
import { isApiError } from '@/lib/api-client';

/**
 * Puts a 400's field errors onto the form's own fields and returns what is left for a message above the form
 * (errors on unknown paths, or the error's own message when no field matched).
 */
export const applyServerErrors = <T extends FieldValues>(
  error: unknown,
  fieldNames: readonly Path<T>[],
  setError: UseFormSetError<T>,
): string | null => {
  if (!isApiError(error)) return 'Something went wrong. Try again.';
  let matched = 0;
  for (const fieldError of error.errors) {
    const name = fieldNames.find((field) => field === fieldError.path);
    if (name) {
      setError(name, { type: 'server', message: fieldError.message }, { shouldFocus: matched === 0 });
      matched += 1;
    }
  }
  return matched > 0 && matched === error.errors.length ? null : error.message;
};
