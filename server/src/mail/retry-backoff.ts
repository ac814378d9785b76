import type { MailRetrySettings } from './mail.config';

/**
 * Milliseconds to wait after failed attempt number `attempt` (1 = the first try) before the next one:
 * `baseDelayMs × 2^(attempt − 1)`, capped at `maxDelayMs` — capped exponential backoff. Null when
 * `attempt` used up the allowance (the message is then failed).
 *
 * @example retryDelayMs(1, { maxAttempts: 5, baseDelayMs: 2000, maxDelayMs: 300000 }) // 2000
 * @example retryDelayMs(5, { maxAttempts: 5, baseDelayMs: 2000, maxDelayMs: 300000 }) // null
 */
export function retryDelayMs(attempt: number, retry: MailRetrySettings): number | null {
  if (attempt >= retry.maxAttempts) return null;
  return Math.min(retry.baseDelayMs * 2 ** (attempt - 1), retry.maxDelayMs);
}
