import type { Express } from 'express';

export interface RouteEntry {
  method: string;
  path: string;
}

interface Layer {
  rawPath?: string;
  route?: { path: string; methods: Record<string, boolean> };
  handle?: { stack?: Layer[] };
}

/**
 * Every route the Express app really serves, read from its router (Express 5 keeps each layer's
 * raw path). Used by the access matrix so that a new route without a row fails the tests.
 */
export function listRoutes(app: Express): RouteEntry[] {
  const root = (app as unknown as { router: { stack: Layer[] } }).router.stack;
  const out: RouteEntry[] = [];
  const walk = (stack: Layer[], prefix: string) => {
    for (const layer of stack) {
      if (layer.route) {
        const path = `${prefix}${layer.route.path === '/' ? '' : layer.route.path}` || '/';
        for (const method of Object.keys(layer.route.methods)) out.push({ method: method.toUpperCase(), path });
      } else if (layer.handle?.stack) {
        walk(layer.handle.stack, `${prefix}${layer.rawPath ?? ''}`);
      }
    }
  };
  walk(root, '');
  return out.filter((route) => route.path.startsWith('/api/') && !route.path.startsWith('/api/auth/'));
}
