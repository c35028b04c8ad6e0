import { vi } from 'vitest';

export interface RecordedCall {
  method: string;
  path: string;
  query: URLSearchParams;
  body: unknown;
}

type Reply = { status: number; body?: unknown };
type Handler = (call: RecordedCall) => Reply | Promise<Reply>;

/** Replaces fetch with handlers keyed "METHOD /path"; unhandled calls fail the test loudly. */
export function mockApi(handlers: Record<string, Handler | Reply>) {
  const calls: RecordedCall[] = [];
  const fetchMock = vi.fn(async (input: RequestInfo | URL, init?: RequestInit) => {
    const url = new URL(String(input), 'http://localhost');
    const method = init?.method ?? 'GET';
    const call: RecordedCall = {
      method,
      path: url.pathname,
      query: url.searchParams,
      body: typeof init?.body === 'string' ? JSON.parse(init.body) : undefined,
    };
    calls.push(call);
    const handler = handlers[`${method} ${url.pathname}`];
    if (!handler) throw new Error(`No mock for ${method} ${url.pathname}`);
    const reply = typeof handler === 'function' ? await handler(call) : handler;
    return reply.status === 204
      ? new Response(null, { status: 204 })
      : new Response(JSON.stringify(reply.body ?? {}), { status: reply.status, headers: { 'Content-Type': 'application/json' } });
  });
  vi.stubGlobal('fetch', fetchMock);
  return { calls, fetchMock, callsTo: (method: string, path: string) => calls.filter((c) => c.method === method && c.path === path) };
}

export const apiError = (status: number, code: string, message: string, fields?: Record<string, string>): Reply => ({
  status,
  body: { error: { code, message, fields, requestId: 'test-request' } },
});
