/** Tries before an e-mail is marked failed for a person to look at (about 6 hours of retries in all). */
export const MAX_ATTEMPTS = 10;
const FIRST_RETRY_MS = 60_000;
const LONGEST_WAIT_MS = 2 * 60 * 60_000;

/** Wait after the n-th failed try: 1 min, 2, 4, 8 … doubling, capped at 2 hours. */
export function retryDelayMs(failedAttempts: number): number {
  const n = Math.max(1, failedAttempts);
  return Math.min(FIRST_RETRY_MS * 2 ** (n - 1), LONGEST_WAIT_MS);
}

/** SMTP 5xx answers are permanent (no such mailbox, refused): trying again will not help. */
export function isPermanentSmtpError(err: unknown): boolean {
  const code = (err as { responseCode?: unknown } | null)?.responseCode;
  return typeof code === 'number' && code >= 500 && code < 600;
}

export function describeSendError(err: unknown): string {
  if (!(err instanceof Error)) return String(err).slice(0, 1000);
  const code = (err as { code?: unknown }).code;
  const text = typeof code === 'string' && !err.message.includes(code) ? `${code}: ${err.message}` : err.message;
  return text.slice(0, 1000);
}
