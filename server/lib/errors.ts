import type { ErrorRequestHandler, RequestHandler } from 'express';
import { ZodError } from 'zod';
import type { ApiErrorBody } from '../../shared/schemas/common';
import { logger } from './logger';

/** An error whose message is safe and useful to show to the person who made the request. */
export class AppError extends Error {
  constructor(
    readonly status: number,
    readonly code: string,
    message: string,
    readonly fields?: Record<string, string>,
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
    body = { code: err.code, message: err.message, fields: err.fields };
  } else if (err instanceof ZodError) {
    status = 400;
    body = { code: 'invalid_input', message: 'Some fields need attention.', fields: fieldsFromZod(err) };
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
    logger.error({ err, requestId, method: req.method, path: req.path }, 'unhandled error');
  }
  res.status(status).json({ error: { ...body, requestId } } satisfies ApiErrorBody);
};

function isBodyParseError(err: unknown): err is { status: number; type: string } {
  return typeof err === 'object' && err !== null && 'type' in err && (err as { type: unknown }).type === 'entity.parse.failed';
}

function isClientHttpError(err: unknown): err is { status: number; message: string } {
  if (typeof err !== 'object' || err === null) return false;
  const { status, expose } = err as { status?: unknown; expose?: unknown };
  // send() marks a missing file's 404 as not exposed; our 404 message is our own, so it is safe either way.
  return typeof status === 'number' && status >= 400 && status < 500 && (expose === true || status === 404);
}
