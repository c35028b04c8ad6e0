import { pino } from 'pino';
import { startupLogLevel } from '../config/env';

export const logger = pino({
  level: startupLogLevel(),
  // Never let credentials reach the log, whatever object gets logged.
  redact: {
    paths: ['password', '*.password', 'req.headers.cookie', 'req.headers.authorization', 'res.headers["set-cookie"]'],
    censor: '[redacted]',
  },
});

// Paths whose last part is a credential: invitation tokens and signed report links (API and pages).
const TOKEN_PATHS = /^(\/api\/invites\/|\/api\/report\/|\/accept-invite\/|\/report\/)[^/?#]+/;

/** The URL as it may be logged: a token in an invitation or report path becomes [token]. */
export function redactUrl(url: string): string {
  return url.replace(TOKEN_PATHS, '$1[token]');
}
