// Every resource router, in one list. A new resource adds one line here.
import type { Router } from "express";
import type { AppDeps } from "../deps";
import { devRoutes } from "./dev/dev.routes";
import { healthRoutes } from "./health/health.routes";
import { meRoutes } from "./me/me.routes";
import { readsRoutes } from "./reads/reads.routes";

export function apiRouters(deps: AppDeps): Router[] {
  const routers = [healthRoutes(deps), meRoutes(deps), readsRoutes(deps)];
  if (deps.config.dev) routers.push(devRoutes(deps));
  return routers;
}
