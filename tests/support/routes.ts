import type { Express } from 'express';
import { ACCESS, type Access } from '@server/http/authz.js';

export interface RouteInfo {
  method: string;
  path: string;
  access: Access | undefined;
}

type Layer = {
  route?: { path: string; methods: Record<string, boolean>; stack: { handle: unknown }[] };
  handle?: { stack?: Layer[] };
};

/** Every route the Express app serves under /api, read from the router itself. */
export function listApiRoutes(app: Express): RouteInfo[] {
  const out: RouteInfo[] = [];
  const walk = (stack: Layer[], prefix: string) => {
    for (const layer of stack) {
      if (layer.route) {
        const first = layer.route.stack[0]?.handle as { [ACCESS]?: Access } | undefined;
        for (const m of Object.keys(layer.route.methods)) {
          if (m === '_all') continue;
          out.push({ method: m.toUpperCase(), path: prefix + layer.route.path, access: first?.[ACCESS] });
        }
      } else if (layer.handle?.stack) {
        // All API routers are mounted at /api (see server/app.ts); nested routers are mounted without a path.
        walk(layer.handle.stack, prefix || '/api');
      }
    }
  };
  const root = (app as unknown as { router: { stack: Layer[] } }).router;
  walk(root.stack, '');
  // The SPA fallback is not an API route.
  return out.filter((r) => r.path.startsWith('/api/'));
}
