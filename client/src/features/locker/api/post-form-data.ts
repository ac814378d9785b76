import { env } from '@/config/env';
import { ApiError } from '@/lib/api-client';

/** An API error from a multipart request that also keeps the parsed body (the import report rides on a 400). */
export class FormDataError extends ApiError {
  readonly body: unknown;

  constructor(statusCode: number, message: string, errors: ApiError['errors'], body: unknown) {
    super(statusCode, message, errors);
    this.body = body;
  }
}

const messageFor = (status: number): string => {
  if (status === 413) return 'The file is too large.';
  if (status === 415) return 'Gramwatt does not take this type of file here.';
  if (status >= 500) return 'The server had a problem. Try again in a moment.';
  return `The request failed (HTTP ${status}).`;
};

const readJson = async (response: Response): Promise<unknown> => {
  try {
    const text = await response.text();
    return text ? (JSON.parse(text) as unknown) : null;
  } catch {
    return null;
  }
};

const fieldErrorsOf = (body: unknown): ApiError['errors'] => {
  const errors = body && typeof body === 'object' ? (body as { errors?: unknown }).errors : undefined;
  if (!Array.isArray(errors)) return [];
  return errors.filter(
    (entry): entry is { path: string; message: string } =>
      !!entry &&
      typeof entry === 'object' &&
      typeof (entry as { path?: unknown }).path === 'string' &&
      typeof (entry as { message?: unknown }).message === 'string',
  );
};

/**
 * POSTs a multipart body (files) under the API base with the session cookie, and reads JSON back.
 * The shared JSON client cannot send files; this one keeps its contract: no redirects or notices, an
 * ApiError (here a FormDataError, which also holds the body) for every answer that is not 2xx.
 */
export const postFormData = async <T>(path: string, formData: FormData): Promise<T> => {
  let response: Response;
  try {
    response = await fetch(new URL(`${env.apiUrl}${path}`, window.location.origin), {
      method: 'POST',
      credentials: 'include',
      headers: { Accept: 'application/json' },
      body: formData,
    });
  } catch {
    throw new ApiError(0, 'Gramwatt could not reach the server. Check your connection and try again.');
  }
  const body = await readJson(response);
  if (!response.ok) {
    const message =
      body && typeof body === 'object' && typeof (body as { message?: unknown }).message === 'string'
        ? (body as { message: string }).message
        : messageFor(response.status);
    throw new FormDataError(response.status, message, fieldErrorsOf(body), body);
  }
  return body as T;
};
