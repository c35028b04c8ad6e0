import type { ErrorRequestHandler, RequestHandler } from 'express';
import { AccessDeniedError, ConnectionError } from 'sequelize';
import { ZodError } from 'zod';
import type { ApiErrorBody } from '../../shared/schemas/common';
import { logger, redactUrl } from './logger';

/** An error whose message is safe and useful to show to the person who made the request. */
export class AppError extends Error {
  constructor(
    readonly status: number,
    readonly code: string,
    message: string,
    readonly fields?: Record<string, string>,
    /** What the server holds now, sent with a 409 so the person can compare it with theirs. */
    readonly current?: unknown,
  ) {
    super(message);
    this.name = 'AppError';
  }
}

export const notFound = (what: string) => new AppError(404, 'not_found', `${what} was not found.`);

export function fieldsFromZod(error: ZodError): Record<string, string> {
  const fields: Record<string, string> = {};
  for (const issue of error.issues) {
    const key = issue.path.length ? issue.path.join('.') : '_';
    fields[key] ??= issue.message;
  }
  return fields;
}

export const unknownRoute: RequestHandler = (req, _res, next) => {
  next(new AppError(404, 'not_found', `There is no API route ${req.method} ${req.path}.`));
};

export const errorHandler: ErrorRequestHandler = (err: unknown, req, res, _next) => {
  const requestId = String(req.id ?? '');
  let status = 500;
  let body: ApiErrorBody['error'];
  if (err instanceof AppError) {
    status = err.status;
    body = { code: err.code, message: err.message, fields: err.fields, ...(err.current !== undefined ? { current: err.current } : {}) };
  } else if (err instanceof ZodError) {
    status = 400;
    body = { code: 'invalid_input', message: 'Some fields need attention.', fields: fieldsFromZod(err) };
  } else if (isDatabaseUnavailable(err)) {
    status = 503;
    body = { code: 'database_unavailable', message: DATABASE_UNAVAILABLE };
    logger.warn({ requestId, method: req.method, path: redactUrl(req.path), err: describe(err) }, 'database not answering; answered 503');
  } else if (tooLargeLimit(err)) {
    status = 413;
    body = { code: 'too_large', message: `The request is larger than ${tooLargeLimit(err)}, the most the server accepts in one request. Shorten the text or send it in parts.` };
  } else if (isBodyParseError(err)) {
    status = err.status;
    body = { code: 'bad_request', message: 'The request body could not be read as JSON.' };
  } else if (isClientHttpError(err)) {
    // 4xx errors raised by Express's own middleware (static files, body size): safe to pass on.
    status = err.status;
    body = { code: status === 404 ? 'not_found' : 'bad_request', message: status === 404 ? `${req.path} was not found.` : err.message };
  } else {
    body = {
      code: 'internal_error',
      message: `Something went wrong on our side. Try again; if it keeps happening, give this reference to support: ${requestId}.`,
    };
    logger.error({ err, requestId, method: req.method, path: redactUrl(req.path) }, 'unhandled error');
  }
  if (status === 503) res.set('Retry-After', '5');
  res.status(status).json({ error: { ...body, requestId } } satisfies ApiErrorBody);
};

export const DATABASE_UNAVAILABLE = 'The database is not answering; try again in a moment.';

// PostgreSQL: admin/crash shutdown and "starting up / shutting down" (57P01-03); class 08, connection exceptions.
const PG_UNAVAILABLE = /^(57P0[123]|08\w{3})$/;
const NODE_UNAVAILABLE = new Set(['ECONNREFUSED', 'ECONNRESET', 'EPIPE', 'ETIMEDOUT', 'EHOSTUNREACH', 'ENOTFOUND']);
// node-postgres reports a connection the server dropped mid-query without any code.
const PG_DROPPED = /^Connection terminated( unexpectedly| due to connection timeout)?$|^Client has encountered a connection error and is not queryable$/;

/**
 * True when the error means "the database cannot be reached right now" (a restart, a failover, a
 * network cut), not a bug: such requests are answered 503 and the pools reconnect by themselves.
 * Looks through Sequelize's wrappers (`parent`, `original`) and `cause`.
 */
export function isDatabaseUnavailable(err: unknown, depth = 0): boolean {
  if (typeof err !== 'object' || err === null || depth > 4) return false;
  const e = err as { name?: unknown; code?: unknown; message?: unknown; parent?: unknown; original?: unknown; cause?: unknown };
  // Refused, host not found, timed out, pool acquire time-out; a wrong password is a setup fault, not an outage.
  if (err instanceof ConnectionError && !(err instanceof AccessDeniedError)) return true;
  if (typeof e.code === 'string' && (PG_UNAVAILABLE.test(e.code) || NODE_UNAVAILABLE.has(e.code))) return true;
  if (typeof e.message === 'string' && PG_DROPPED.test(e.message)) return true;
  return [e.parent, e.original, e.cause].some((inner) => inner !== err && isDatabaseUnavailable(inner, depth + 1));
}

const describe = (err: unknown) => (err instanceof Error ? { name: err.name, message: err.message, code: (err as { code?: unknown }).code } : String(err));

/** body-parser's refusal of a body over its limit: the limit in words ("1 MB"), or null for any other error. */
function tooLargeLimit(err: unknown): string | null {
  if (typeof err !== 'object' || err === null || (err as { type?: unknown }).type !== 'entity.too.large') return null;
  const bytes = (err as { limit?: unknown }).limit;
  if (typeof bytes !== 'number') return 'the limit';
  return bytes >= 1024 * 1024 ? `${Math.round(bytes / (1024 * 1024))} MB` : `${Math.round(bytes / 1024)} kB`;
}

function isBodyParseError(err: unknown): err is { status: number; type: string } {
  return typeof err === 'object' && err !== null && 'type' in err && (err as { type: unknown }).type === 'entity.parse.failed';
}

function isClientHttpError(err: unknown): err is { status: number; message: string } {
  if (typeof err !== 'object' || err === null) return false;
  const { status, expose } = err as { status?: unknown; expose?: unknown };
  // send() marks a missing file's 404 as not exposed; our 404 message is our own, so it is safe either way.
  return typeof status === 'number' && status >= 400 && status < 500 && (expose === true || status === 404);
}
