import type { Router } from 'express';

import { apiRouters } from '../../server/routes';

// Lists "METHOD /full/path" for every route registered on the API routers.
export function registeredRoutes(): string[] {
  const routes: string[] = [];
  for (const { prefix, router } of apiRouters) {
    for (const layer of (router as Router & { stack: { route?: { path: string; methods: Record<string, boolean> } }[] }).stack) {
      if (!layer.route) continue;
      for (const method of Object.keys(layer.route.methods)) {
        if (method === '_all') continue;
        const suffix = layer.route.path === '/' ? '' : layer.route.path;
        routes.push(`${method.toUpperCase()} ${prefix}${suffix}`);
      }
    }
  }
  return routes.sort();
}
