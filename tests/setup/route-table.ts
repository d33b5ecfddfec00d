import type { Express } from "express";

/** One route of the app, as Express holds it: method and full path pattern, e.g. "GET /api/visits/:id". */
export interface AppRoute {
  method: string;
  path: string;
  key: string;
}

interface Layer {
  rawPath?: string | string[];
  route?: { path: string | string[]; methods: Record<string, boolean> };
  handle?: { stack?: Layer[]; isPermissionGate?: boolean };
}

const joinPath = (base: string, path: string) => `${base}/${path}`.replace(/\/+/g, "/").replace(/(.)\/$/, "$1");

/**
 * Every route the app answers, read from its router stack (Express 5 / router 2.x: a layer's
 * `rawPath` is its mount path, `route` its route, `handle.stack` a mounted router's layers),
 * not from a hand-written list, so a new route is found the moment it is added.
 */
export function appRoutes(app: Express): AppRoute[] {
  const found = new Map<string, AppRoute>();
  const walk = (layers: Layer[], base: string) => {
    for (const layer of layers) {
      if (layer.route) {
        for (const path of ([] as string[]).concat(layer.route.path)) {
          for (const [method, on] of Object.entries(layer.route.methods)) {
            if (!on || method === "_all") continue;
            const route = { method: method.toUpperCase(), path: joinPath(base, path) };
            found.set(`${route.method} ${route.path}`, { ...route, key: `${route.method} ${route.path}` });
          }
        }
      } else if (layer.handle?.stack && !layer.handle.isPermissionGate) {
        const mount = typeof layer.rawPath === "string" ? layer.rawPath : "/";
        walk(layer.handle.stack, joinPath(base, mount));
      }
    }
  };
  walk((app as unknown as { router: { stack: Layer[] } }).router.stack, "");
  // The client's fallback serves pages, not the API.
  return [...found.values()].filter((route) => route.path.startsWith("/api/") || route.path === "/api");
}
