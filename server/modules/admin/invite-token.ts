import { createHash, randomBytes } from 'node:crypto';

/** Seven days: long enough for someone on a week of site visits to open the e-mail. */
export const INVITE_LIFETIME_MS = 7 * 24 * 60 * 60 * 1000;

/** 256 random bits, base64url (43 characters); the link carries the token, the table only its hash. */
export function newInviteToken(): { token: string; tokenHash: string } {
  const token = randomBytes(32).toString('base64url');
  return { token, tokenHash: hashInviteToken(token) };
}

// A plain SHA-256 is enough here: the token is random and long, so there is nothing to brute-force.
export const hashInviteToken = (token: string) => createHash('sha256').update(token).digest('hex');

export const invitePath = (token: string) => `/accept-invite/${token}`;
