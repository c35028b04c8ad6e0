import type { ApiErrorBody } from '@shared/schemas/common';
import { ApiError } from './api-error';

export type Query = Record<string, string | number | undefined>;

interface RequestOptions {
  method?: 'GET' | 'POST' | 'PATCH' | 'PUT' | 'DELETE';
  /** JSON-encoded, except FormData, which goes as multipart/form-data (the browser sets the boundary). */
  body?: unknown;
  query?: Query;
  signal?: AbortSignal;
  /** What to tell the person when the request never reached the server, when the default says too little. */
  networkError?: string;
}

const NETWORK_ERROR = {
  code: 'network_error',
  message: 'Could not reach Crankwise. Check this device’s network connection, then try again.',
};

export function buildUrl(path: string, query?: Query): string {
  const params = new URLSearchParams();
  for (const [key, value] of Object.entries(query ?? {})) {
    if (value !== undefined && value !== '') params.set(key, String(value));
  }
  const search = params.toString();
  return search ? `${path}?${search}` : path;
}

/** Calls the same-origin JSON API with the session cookie; throws ApiError on any failure. */
export async function apiRequest<T>(path: string, options: RequestOptions = {}): Promise<T> {
  const { method = 'GET', body, query, signal, networkError } = options;
  const isForm = body instanceof FormData;
  let response: Response;
  try {
    response = await fetch(buildUrl(path, query), {
      method,
      credentials: 'same-origin',
      // Every change declares JSON, even without a body: the server refuses any other change (a form post
      // from another site). A photo upload is multipart: the browser sets its own boundary header.
      headers: method === 'GET' || isForm ? { Accept: 'application/json' } : { Accept: 'application/json', 'Content-Type': 'application/json' },
      body: body === undefined ? undefined : isForm ? body : JSON.stringify(body),
      signal,
    });
  } catch (error) {
    if (signal?.aborted) throw error;
    throw new ApiError(0, networkError ? { ...NETWORK_ERROR, message: networkError } : NETWORK_ERROR);
  }
  if (response.status === 204) return undefined as T;
  const payload: unknown = await response.json().catch(() => undefined);
  if (!response.ok) throw new ApiError(response.status, errorBody(response.status, payload));
  return payload as T;
}

function errorBody(status: number, payload: unknown): ApiErrorBody['error'] {
  const error = (payload as Partial<ApiErrorBody> | undefined)?.error;
  if (error && typeof error.message === 'string') return error;
  return {
    code: 'http_error',
    message: `The server answered with an unexpected error (HTTP ${status}). Try again in a moment.`,
  };
}
