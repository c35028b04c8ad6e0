import type { Express } from 'express';

// Express 5 (router 2) keeps each layer's path as written (`rawPath`); a mounted router keeps its
// own stack, and a route layer keeps its methods. Walking them lists every route the app serves.

interface Layer {
  rawPath?: unknown;
  route?: { path: unknown; methods: Record<string, boolean> };
  handle?: { stack?: Layer[] };
}

export interface RouteEntry {
  method: string;
  /** Full path with parameter names, e.g. /api/visits/:id/close. */
  path: string;
}

const join = (prefix: string, path: string) => `${prefix}/${path}`.replace(/\/+/g, '/').replace(/(.)\/$/, '$1');

function walk(stack: Layer[], prefix: string, out: RouteEntry[]): void {
  for (const layer of stack) {
    const raw = typeof layer.rawPath === 'string' ? layer.rawPath : null;
    if (layer.route) {
      // A regular-expression route (the client's page fallback) has no path to list.
      if (typeof layer.route.path !== 'string') continue;
      for (const [method, on] of Object.entries(layer.route.methods)) {
        if (on && method !== '_all') out.push({ method: method.toUpperCase(), path: join(prefix, layer.route.path) });
      }
    } else if (layer.handle?.stack && raw !== null) {
      walk(layer.handle.stack, join(prefix, raw), out);
    }
  }
}

/** Every route of the app under the given prefix, as "METHOD /path" entries in registration order. */
export function listRoutes(app: Express, under = '/api'): RouteEntry[] {
  const router = (app as unknown as { router?: { stack: Layer[] } }).router;
  if (!router) throw new Error('the app has no router: is this Express 5?');
  const out: RouteEntry[] = [];
  walk(router.stack, '', out);
  return out.filter((r) => r.path === under || r.path.startsWith(`${under}/`));
}
