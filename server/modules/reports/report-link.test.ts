import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { newLinkNonce, readReportLink, reportLinkKey, signReportLink, verifyReportLink } from './report-link';

const key = reportLinkKey({ SESSION_SECRET: 'a-session-secret-for-the-tests' });
const nonce = newLinkNonce();
const now = new Date('2026-12-02T10:00:00Z');
const inThirtyDays = Math.floor(now.getTime() / 1000) + 30 * 86_400;
const claims = { visitId: 123, issueNumber: 1, expiresAt: inThirtyDays };
const BASE64URL = 'ABCDEFGHIJKLMNOPQRSTUVWXYZabcdefghijklmnopqrstuvwxyz0123456789-_';
const payloadOf = (text: string) => Buffer.from(text).toString('base64url');

describe('signed report links', () => {
  it('round-trips: a link made for a visit verifies and names that visit', () => {
    const token = signReportLink(key, claims, nonce);
    expect(token).toMatch(/^[A-Za-z0-9_-]+$/);
    expect(verifyReportLink(key, token, nonce, now)).toBe(true);
    expect(readReportLink(token)).toEqual(claims);
  });

  it('derives the same key from the same session secret (links survive a restart) and a different one otherwise', () => {
    const again = reportLinkKey({ SESSION_SECRET: 'a-session-secret-for-the-tests' });
    expect(again.equals(key)).toBe(true);
    expect(reportLinkKey({ SESSION_SECRET: 'another-session-secret-value' }).equals(key)).toBe(false);
    expect(reportLinkKey({ SESSION_SECRET: 'x'.repeat(20), REPORT_LINK_SECRET: 'y'.repeat(32) }).toString()).toBe('y'.repeat(32));
  });

  it('refuses a link after its expiry, and accepts it one second before', () => {
    const token = signReportLink(key, claims, nonce);
    expect(verifyReportLink(key, token, nonce, new Date(inThirtyDays * 1000 - 1000))).toBe(true);
    expect(verifyReportLink(key, token, nonce, new Date(inThirtyDays * 1000))).toBe(false);
  });

  it('refuses a link with any single character changed, wherever it is', () => {
    const token = signReportLink(key, claims, nonce);
    fc.assert(
      fc.property(fc.nat({ max: token.length - 1 }), fc.constantFrom(...(BASE64URL + '.~').split('')), (at, replacement) => {
        fc.pre(token[at] !== replacement);
        const altered = token.slice(0, at) + replacement + token.slice(at + 1);
        expect(verifyReportLink(key, altered, nonce, now)).toBe(false);
      }),
      { numRuns: 2000 },
    );
  });

  it('refuses a link moved to another visit, a later expiry or another issue, and one whose nonce was replaced', () => {
    const token = signReportLink(key, claims, nonce);
    const mac = token.slice(-43);
    expect(verifyReportLink(key, payloadOf(`123.1.${inThirtyDays}`) + mac, nonce, now)).toBe(true);
    expect(verifyReportLink(key, payloadOf(`124.1.${inThirtyDays}`) + mac, nonce, now)).toBe(false);
    expect(verifyReportLink(key, payloadOf(`123.1.${inThirtyDays + 86_400}`) + mac, nonce, now)).toBe(false);
    expect(verifyReportLink(key, payloadOf(`123.2.${inThirtyDays}`) + mac, nonce, now)).toBe(false);
    expect(verifyReportLink(key, token, newLinkNonce(), now)).toBe(false);
    expect(verifyReportLink(reportLinkKey({ SESSION_SECRET: 'another-session-secret-value' }), token, nonce, now)).toBe(false);
  });

  it('refuses malformed links without throwing', () => {
    for (const bad of ['', 'abc', '1.1.1', `${signReportLink(key, claims, nonce)}x`, payloadOf('0.1.99999') + 'A'.repeat(43), payloadOf('1.1') + 'A'.repeat(43), '../../etc/passwd']) {
      expect(verifyReportLink(key, bad, nonce, now)).toBe(false);
    }
  });
});
