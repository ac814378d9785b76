/**
 * The message of anything thrown, for a log line or a stored failure: an Error's own message, anything else as text
 * (a library may throw a string or a plain object).
 * @example errorMessage(new Error('disk full')) // 'disk full'
 */
export function errorMessage(error: unknown): string {
  return error instanceof Error ? error.message : String(error);
}
