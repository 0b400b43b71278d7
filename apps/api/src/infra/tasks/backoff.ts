export interface BackoffOptions {
  /** Delay before the first retry, before jitter (ms). */
  baseMs: number;
  /** Longest delay, before jitter (ms). */
  maxMs: number;
}

/**
 * Exponential backoff with "equal jitter": the n-th retry waits between half and all of
 * base·2^(n-1) (capped). Half is fixed so delays keep growing; the random half spreads
 * retries of many tasks that failed together (a common technique, no standard behind it).
 */
export function retryDelay(failedAttempts: number, opts: BackoffOptions, random: () => number = Math.random): number {
  const ceiling = Math.min(opts.maxMs, opts.baseMs * 2 ** Math.max(0, failedAttempts - 1));
  return Math.round(ceiling / 2 + (ceiling / 2) * random());
}
