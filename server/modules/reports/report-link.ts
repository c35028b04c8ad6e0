import { createHmac, hkdfSync, randomBytes, timingSafeEqual } from 'node:crypto';

/**
 * The customer's link to one visit's report: base64url(`<visitId>.<issue>.<expires>`) followed by the
 * 43-character base64url HMAC-SHA256 over the purpose, visit, issue number, expiry and the issue's random
 * nonce (kept in the database, never in the link). A newer issue has a new nonce, so older links stop
 * working. The token has no dots, so the page path /report/<token> never looks like a file name.
 */
export interface ReportLinkClaims {
  visitId: number;
  issueNumber: number;
  /** Unix seconds. */
  expiresAt: number;
}

const PURPOSE = 'report';
const MAC_LENGTH = 43;
const TOKEN = /^[A-Za-z0-9_-]{4,40}[A-Za-z0-9_-]{43}$/;
const CLAIMS = /^([1-9]\d{0,9})\.([1-9]\d{0,5})\.([1-9]\d{0,11})$/;

/** The link key: REPORT_LINK_SECRET, or one derived from SESSION_SECRET so links survive a restart. */
export function reportLinkKey(env: { REPORT_LINK_SECRET?: string; SESSION_SECRET: string }): Buffer {
  if (env.REPORT_LINK_SECRET) return Buffer.from(env.REPORT_LINK_SECRET, 'utf8');
  return Buffer.from(hkdfSync('sha256', env.SESSION_SECRET, 'crankwise', 'report-link-v1', 32));
}

export const newLinkNonce = () => randomBytes(16).toString('base64url');

function mac(key: Buffer, claims: ReportLinkClaims, nonce: string): string {
  return createHmac('sha256', key).update(`${PURPOSE}|${claims.visitId}|${claims.issueNumber}|${claims.expiresAt}|${nonce}`).digest('base64url');
}

export function signReportLink(key: Buffer, claims: ReportLinkClaims, nonce: string): string {
  const payload = Buffer.from(`${claims.visitId}.${claims.issueNumber}.${claims.expiresAt}`, 'utf8').toString('base64url');
  return `${payload}${mac(key, claims, nonce)}`;
}

/** Reads the claims without trusting them: only to find the issue whose nonce verifies the link. */
export function readReportLink(token: string): ReportLinkClaims | null {
  if (!TOKEN.test(token)) return null;
  const payload = token.slice(0, -MAC_LENGTH);
  const bytes = Buffer.from(payload, 'base64url');
  // Only the one spelling we make is accepted: base64url can hide spare bits in its last character.
  if (bytes.toString('base64url') !== payload) return null;
  const m = CLAIMS.exec(bytes.toString('utf8'));
  if (!m) return null;
  return { visitId: Number(m[1]), issueNumber: Number(m[2]), expiresAt: Number(m[3]) };
}

/** True when the link was made with this key and nonce and has not expired; compared in constant time. */
export function verifyReportLink(key: Buffer, token: string, nonce: string, now: Date = new Date()): boolean {
  const claims = readReportLink(token);
  if (!claims) return false;
  const given = Buffer.from(token.slice(-MAC_LENGTH), 'utf8');
  const expected = Buffer.from(mac(key, claims, nonce), 'utf8');
  // The string is compared, not decoded bytes, so no second spelling of the same MAC is accepted.
  const genuine = given.length === expected.length && timingSafeEqual(given, expected);
  return genuine && claims.expiresAt * 1000 > now.getTime();
}
