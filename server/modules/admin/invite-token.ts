import { createHash, createHmac, hkdfSync, randomBytes } from 'node:crypto';

/** Seven days: long enough for someone on a week of site visits to open the e-mail. */
export const INVITE_LIFETIME_MS = 7 * 24 * 60 * 60 * 1000;

/** The invitation key: derived from SESSION_SECRET (its own purpose label), never stored in the database. */
export function inviteLinkKey(env: { SESSION_SECRET: string }): Buffer {
  return Buffer.from(hkdfSync('sha256', env.SESSION_SECRET, 'crankwise', 'invite-link-v1', 32));
}

let configuredKey: Buffer | undefined;

/** Set once when the app is built (createApp). */
export function configureInviteKey(key: Buffer): void {
  configuredKey = key;
}

function inviteKey(): Buffer {
  if (!configuredKey) throw new Error('invitations are not configured: build the app with createApp() first');
  return configuredKey;
}

export const newInviteNonce = () => randomBytes(16).toString('base64url');

/**
 * The token in the link: HMAC-SHA256 of the invitation's random nonce under the server key (43
 * base64url characters). The table keeps the nonce and the token's hash; the outbox makes the token
 * again when it sends the e-mail, so neither the table nor a stored e-mail holds a usable link.
 */
export const inviteTokenFor = (nonce: string, key: Buffer = inviteKey()) => createHmac('sha256', key).update(`invite|${nonce}`).digest('base64url');

/** A fresh nonce with its token and the token's hash. */
export function newInviteToken(): { nonce: string; token: string; tokenHash: string } {
  const nonce = newInviteNonce();
  const token = inviteTokenFor(nonce);
  return { nonce, token, tokenHash: hashInviteToken(token) };
}

// A plain SHA-256 is enough here: the token is an HMAC output, so there is nothing to brute-force.
export const hashInviteToken = (token: string) => createHash('sha256').update(token).digest('hex');

export const invitePath = (token: string) => `/accept-invite/${token}`;
