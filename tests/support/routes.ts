import type express from 'express';

interface Layer {
  rawPath?: string | string[];
  route?: { path: string; methods: Record<string, boolean> };
  handle?: { stack?: Layer[] };
}

/** Every route an Express 5 app serves, as `METHOD /path` (ALL for app.all), walking mounted routers. */
export function listRoutes(app: express.Express): string[] {
  const routes: string[] = [];
  const walk = (stack: Layer[], prefix: string) => {
    for (const layer of stack) {
      if (layer.route) {
        for (const method of Object.keys(layer.route.methods)) routes.push(`${method === '_all' ? 'ALL' : method.toUpperCase()} ${prefix}${layer.route.path}`);
      } else if (layer.handle?.stack && typeof layer.rawPath === 'string') {
        walk(layer.handle.stack, prefix + layer.rawPath);
      }
    }
  };
  walk((app as unknown as { router: { stack: Layer[] } }).router.stack, '');
  return [...new Set(routes)].sort();
}
