import type { Request, RequestHandler } from 'express';
import { AppError } from './errors';

// A browser sends a form post (text/plain, urlencoded or multipart) to any site without asking, and
// SameSite=Lax cookies still go with it from another port of the same host. So every state-changing
// /api request must (1) come from our own pages, by the browser's Sec-Fetch-Site or Origin header,
// which a page cannot forge, and (2) declare a JSON body, which a plain form cannot send.

const SAFE_METHODS = new Set(['GET', 'HEAD', 'OPTIONS']);

interface SameOriginOptions {
  /** PUBLIC_BASE_URL: the address people open; its origin is always ours. */
  publicBaseUrl: string;
  /** Routes (path below /api) that take a multipart photo upload instead of JSON. */
  multipartPaths: RegExp[];
}

const mediaType = (req: Request) => (req.headers['content-type'] ?? '').split(';')[0]!.trim().toLowerCase();

function fromOurPages(req: Request, ownOrigins: Set<string>): boolean {
  const site = req.headers['sec-fetch-site'];
  if (site === 'same-origin' || site === 'none') return true;
  const origin = req.headers.origin;
  if (!origin) return false;
  // Behind a proxy the request's own address can differ from PUBLIC_BASE_URL; both are ours.
  return ownOrigins.has(origin.toLowerCase()) || origin.toLowerCase() === `${req.protocol}://${req.get('host') ?? ''}`.toLowerCase();
}

export function sameOriginJson({ publicBaseUrl, multipartPaths }: SameOriginOptions): RequestHandler {
  const ownOrigins = new Set([new URL(publicBaseUrl).origin.toLowerCase()]);
  return (req, _res, next) => {
    if (SAFE_METHODS.has(req.method)) {
      next();
      return;
    }
    if (!fromOurPages(req, ownOrigins)) {
      next(
        new AppError(
          403,
          'cross_origin',
          'This request did not come from a Crankwise page, so it was refused. Open Crankwise at its own address and try again from there.',
        ),
      );
      return;
    }
    const type = mediaType(req);
    const multipart = type === 'multipart/form-data' && req.method === 'POST' && multipartPaths.some((p) => p.test(req.path));
    if (type !== 'application/json' && !multipart) {
      next(
        new AppError(
          415,
          'unsupported_media_type',
          'Send this request as JSON with the header Content-Type: application/json (even when it has no body).',
        ),
      );
      return;
    }
    next();
  };
}
