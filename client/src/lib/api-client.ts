import type { ApiError as ApiErrorBody, ApiFieldError } from '@gramwatt/shared';
import { env } from '@/config/env';

/**
 * An API answer other than 2xx, in the one error shape of the API (`{statusCode, message, errors}`).
 * A network failure or an answer that is not JSON becomes an ApiError too, with statusCode 0 or the HTTP status.
 */
export class ApiError extends Error {
  override readonly name = 'ApiError';
  readonly statusCode: number;
  readonly errors: ApiFieldError[];
  /** Seconds the server asks us to wait before trying again (`Retry-After` on a 503 or 429), or null. */
  readonly retryAfterS: number | null;

  constructor(statusCode: number, message: string, errors: ApiFieldError[] = [], retryAfterS: number | null = null) {
    super(message);
    this.statusCode = statusCode;
    this.errors = errors;
    this.retryAfterS = retryAfterS;
  }
}

/** True when `error` is an ApiError with this status code. */
export const isApiError = (error: unknown, statusCode?: number): error is ApiError =>
  error instanceof ApiError && (statusCode === undefined || error.statusCode === statusCode);

type JsonBody = Record<string, unknown> | unknown[];

interface RequestOptions {
  method?: 'GET' | 'POST' | 'PATCH' | 'PUT' | 'DELETE';
  body?: JsonBody;
  signal?: AbortSignal;
}

const fallbackMessage = (status: number): string =>
  status >= 500 ? 'The server had a problem. Try again in a moment.' : `The request failed (HTTP ${status}).`;

/**
 * Whether a body has the API's error shape (`apiErrorSchema` of the shared package). Checked by hand so the
 * first page does not have to load the whole schema library just to read an error.
 */
const isApiErrorBody = (body: unknown): body is ApiErrorBody => {
  if (!body || typeof body !== 'object') return false;
  const { statusCode, message, errors } = body as Record<string, unknown>;
  return (
    typeof statusCode === 'number' &&
    typeof message === 'string' &&
    Array.isArray(errors) &&
    errors.every(
      (entry: unknown) =>
        !!entry &&
        typeof entry === 'object' &&
        typeof (entry as Record<string, unknown>).path === 'string' &&
        typeof (entry as Record<string, unknown>).message === 'string',
    )
  );
};

/** `Retry-After` as whole seconds: either a number of seconds or an HTTP date (RFC 9110 §10.2.3). */
const retryAfterSeconds = (response: Response): number | null => {
  const header = response.headers.get('Retry-After')?.trim();
  if (!header) return null;
  if (/^\d+$/.test(header)) return Number(header);
  const atMs = Date.parse(header);
  return Number.isNaN(atMs) ? null : Math.max(0, Math.ceil((atMs - Date.now()) / 1000));
};

const toApiError = async (response: Response): Promise<ApiError> => {
  const retryAfterS = retryAfterSeconds(response);
  let payload: unknown = null;
  try {
    payload = await response.json();
  } catch {
    // Not JSON (a proxy's HTML page, an empty body): fall back to the status alone.
  }
  if (isApiErrorBody(payload)) return new ApiError(response.status, payload.message, payload.errors, retryAfterS);
  const message =
    payload && typeof payload === 'object' && 'message' in payload && typeof payload.message === 'string'
      ? payload.message
      : fallbackMessage(response.status);
  return new ApiError(response.status, message, [], retryAfterS);
};

/**
 * Calls `path` under the API base with JSON in and out and the session cookie, and throws an ApiError on failure.
 * It does nothing else: no redirects, no notices — callers decide what an error means.
 * @example await apiRequest<{ account: Account }>('/auth/me')
 */
export const apiRequest = async <T>(
  path: string,
  { method = 'GET', body, signal }: RequestOptions = {},
): Promise<T> => {
  // Absolute against the page's origin, so the same code runs in the browser and in tests.
  const url = new URL(`${env.apiUrl}${path}`, window.location.origin);
  let response: Response;
  try {
    response = await fetch(url, {
      method,
      credentials: 'include',
      headers: { Accept: 'application/json', ...(body === undefined ? {} : { 'Content-Type': 'application/json' }) },
      body: body === undefined ? undefined : JSON.stringify(body),
      signal,
    });
  } catch (error) {
    if (error instanceof DOMException && error.name === 'AbortError') throw error;
    throw new ApiError(0, 'Gramwatt could not reach the server. Check your connection and try again.');
  }
  if (!response.ok) throw await toApiError(response);
  if (response.status === 204) return undefined as T;
  const text = await response.text();
  return (text ? JSON.parse(text) : undefined) as T;
};

/** Shorthands per HTTP method. */
export const api = {
  get: <T>(path: string, signal?: AbortSignal) => apiRequest<T>(path, { signal }),
  post: <T>(path: string, body?: JsonBody) => apiRequest<T>(path, { method: 'POST', body }),
  patch: <T>(path: string, body: JsonBody) => apiRequest<T>(path, { method: 'PATCH', body }),
  put: <T>(path: string, body: JsonBody) => apiRequest<T>(path, { method: 'PUT', body }),
  delete: <T>(path: string) => apiRequest<T>(path, { method: 'DELETE' }),
};
