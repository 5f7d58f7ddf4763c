// Lists every JSON API route the app has, by walking Express's router stacks: a test that covers
// "every route" stays complete as routes are added.
import type { Express } from "express";

export type ApiRoute = { method: string; path: string };

type Layer = { route?: { path: string; methods: Record<string, boolean> }; handle?: { stack?: Layer[] } };

export function listApiRoutes(app: Express): ApiRoute[] {
  const out: ApiRoute[] = [];
  const walk = (stack: Layer[], prefix: string) => {
    for (const layer of stack) {
      if (layer.route) {
        if (layer.route.path.startsWith("/api/auth")) continue; // better-auth's own catch-all
        for (const method of Object.keys(layer.route.methods)) out.push({ method: method.toUpperCase(), path: prefix + layer.route.path });
      } else if (layer.handle?.stack) {
        walk(layer.handle.stack, prefix);
      }
    }
  };
  // The first nested router under the app is the one mounted at /api.
  const top = (app as unknown as { router: { stack: Layer[] } }).router.stack;
  for (const layer of top) {
    if (!layer.route && layer.handle?.stack) walk(layer.handle.stack, "/api");
  }
  return out;
}

/** Fills path parameters (":id", ":token", …) with the given values. */
export function fillPath(path: string, value: (name: string) => string): string {
  return path.replace(/:(\w+)/g, (_, name: string) => encodeURIComponent(value(name)));
}
