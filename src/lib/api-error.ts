import type { ApiErrorBody } from '@shared/schemas/common';

/** A failed API call; `message` is written for the person using the app. */
export class ApiError extends Error {
  readonly status: number;
  readonly code: string;
  readonly fields: Record<string, string>;
  readonly requestId: string | undefined;
  /** With a 409 stale_version: what the server holds now. */
  readonly current: unknown;

  constructor(status: number, body: ApiErrorBody['error']) {
    super(body.message);
    this.name = 'ApiError';
    this.status = status;
    this.code = body.code;
    this.fields = body.fields ?? {};
    this.requestId = body.requestId;
    this.current = body.current;
  }
}

export const isApiError = (error: unknown): error is ApiError => error instanceof ApiError;

export const isUnauthorized = (error: unknown) => isApiError(error) && error.status === 401;
/** Someone else (another tab or device) changed what this write was based on; `current` holds the server's value. */
export const isStaleVersion = (error: unknown): error is ApiError => isApiError(error) && error.status === 409 && error.code === 'stale_version';
export const isForbidden = (error: unknown) => isApiError(error) && error.status === 403;

/** The message to show for any error, whether or not it came from the API. */
export function errorMessage(error: unknown): string {
  if (isApiError(error)) return error.message;
  return 'Something went wrong in the app. Reload the page and try again.';
}
