import { describe, expect, it } from 'vitest';
import { MAX_ATTEMPTS, isPermanentSmtpError, retryDelayMs } from './retry-policy';

describe('outbox retry policy', () => {
  it('waits 1, 2, 4, 8 minutes after successive failures and never more than 2 hours', () => {
    expect([1, 2, 3, 4].map(retryDelayMs)).toEqual([60_000, 120_000, 240_000, 480_000]);
    expect(retryDelayMs(8)).toBe(2 * 60 * 60_000);
    expect(retryDelayMs(MAX_ATTEMPTS)).toBe(2 * 60 * 60_000);
  });

  it('gives up at once only on a permanent (5xx) SMTP answer, not on a refused connection', () => {
    expect(isPermanentSmtpError({ responseCode: 550 })).toBe(true);
    expect(isPermanentSmtpError({ responseCode: 451 })).toBe(false);
    expect(isPermanentSmtpError(Object.assign(new Error('connect ECONNREFUSED'), { code: 'ECONNREFUSED' }))).toBe(false);
  });
});
