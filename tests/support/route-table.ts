// The app's own list of routes, read from Express 5's router stack, so tests that must cover
// "every route" notice when one is added or removed.
import type { Express } from 'express';

export type HttpMethod = 'GET' | 'POST' | 'PUT' | 'PATCH' | 'DELETE';
export interface RouteEntry {
  method: HttpMethod;
  path: string;
  /** "METHOD /path", the key the expectation tables use. */
  key: string;
}

interface Layer {
  route?: { path: string | string[]; methods: Record<string, boolean> };
  handle?: { stack?: Layer[] };
  rawPath?: string | string[];
  slash?: boolean;
}

const METHODS: readonly HttpMethod[] = ['GET', 'POST', 'PUT', 'PATCH', 'DELETE'];
const STATE_CHANGING: ReadonlySet<HttpMethod> = new Set(['POST', 'PUT', 'PATCH', 'DELETE']);

function walk(stack: Layer[], prefix: string, out: RouteEntry[]): void {
  for (const layer of stack) {
    if (layer.route) {
      for (const path of [layer.route.path].flat()) {
        for (const method of METHODS) {
          if (layer.route.methods[method.toLowerCase()]) out.push({ method, path: prefix + path, key: `${method} ${prefix + path}` });
        }
      }
    } else if (layer.handle?.stack) {
      if (!layer.slash && typeof layer.rawPath !== 'string')
        throw new Error('route-table: a router mounted on several paths cannot be listed');
      walk(layer.handle.stack, layer.slash ? prefix : prefix + String(layer.rawPath), out);
    }
  }
}

/** Every route of the app (nested routers included), in registration order, without duplicates. */
export function listRoutes(app: Express): RouteEntry[] {
  const router = (app as unknown as { router: { stack: Layer[] } }).router;
  const out: RouteEntry[] = [];
  walk(router.stack, '', out);
  return [...new Map(out.map((r) => [r.key, r])).values()];
}

/** POST, PUT, PATCH and DELETE routes: everything that may change state. */
export const stateChangingRoutes = (app: Express) => listRoutes(app).filter((r) => STATE_CHANGING.has(r.method));

/**
 * Routes whose URL carries its own credential (the one-click unsubscribe link, RFC 8058): no session, so no CSRF
 * token, and other sites' servers (mail providers) POST them by design, so no same-origin check either.
 */
export const SIGNED_LINK_ROUTES: ReadonlySet<string> = new Set(['POST /api/mail/unsubscribe/:userId/:kind/:token']);

/** The pure workbench calculations, which store nothing and answer anyone. */
export const isWorkbench = (key: string) => /^POST \/api\/workbench\/[a-z-]+$/.test(key);

/** Replace `:name` segments with values. */
export function fillPath(path: string, params: Record<string, string | number>): string {
  return path.replace(/:(\w+)/g, (_, name: string) => {
    if (params[name] === undefined) throw new Error(`no value for :${name} in ${path}`);
    return encodeURIComponent(String(params[name]));
  });
}
