/**
 * Wait before retry number `attempt` (1 = the first retry): base × 2^(attempt−1), capped.
 * Exponential backoff is common practice for retrying a remote service (no single source);
 * doubling keeps an outage of hours to a handful of attempts.
 */
export function retryDelayMs(attempt: number, baseMs: number, capMs = 3_600_000): number {
  if (!Number.isInteger(attempt) || attempt < 1) throw new RangeError('attempt must be an integer from 1');
  return Math.min(capMs, baseMs * 2 ** (attempt - 1));
}
