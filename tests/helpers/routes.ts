/** The routes an Express 5 app has registered, for tests that must cover every one of them. */
import type { Express } from 'express';

interface Layer {
  rawPath?: string | RegExp | (string | RegExp)[];
  route?: { path: string; methods: Record<string, boolean> };
  handle?: { stack?: Layer[] };
}

/** Walks the router stack (Express 5 / router 2) and lists "METHOD /full/path" for every route. */
export function listRoutes(app: Express): string[] {
  const out: string[] = [];
  const walk = (stack: Layer[], prefix: string) => {
    for (const layer of stack) {
      if (layer.route) {
        // A route's layer carries the route's own path, so only the mount prefix is added.
        const path = layer.route.path === '/' && prefix !== '' ? prefix : `${prefix}${layer.route.path}`;
        for (const m of Object.keys(layer.route.methods)) if (m !== '_all') out.push(`${m.toUpperCase()} ${path}`);
      } else if (layer.handle?.stack) {
        const raw = typeof layer.rawPath === 'string' ? layer.rawPath : '';
        walk(layer.handle.stack, raw === '/' ? prefix : `${prefix}${raw}`);
      }
    }
  };
  walk((app as unknown as { router: { stack: Layer[] } }).router.stack, '');
  return [...new Set(out)].sort();
}
