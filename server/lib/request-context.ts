import { AsyncLocalStorage } from 'node:async_hooks';
import type { RequestHandler } from 'express';

/** Where the current request came from, for the audit trail (set once per request in app.ts). */
export interface RequestClient {
  ip: string | null;
  userAgent: string | null;
}

const storage = new AsyncLocalStorage<RequestClient>();

export const requestClientContext: RequestHandler = (req, _res, next) => {
  const agent = req.get('user-agent');
  storage.run({ ip: req.ip ?? null, userAgent: agent ? agent.slice(0, 200) : null }, next);
};

/** The client of the request being handled, or undefined outside a request (worker, scripts). */
export const currentClient = (): RequestClient | undefined => storage.getStore();
