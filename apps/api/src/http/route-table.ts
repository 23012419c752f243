import type { RequestHandler, Router } from "express";
import { authorize } from "../auth/authorize.js";
import type { Policy } from "../auth/policy.js";

export type Method = "get" | "post" | "put" | "patch" | "delete";

export interface RouteSpec {
  method: Method;
  path: string;
  policy: Policy;
  handlers: RequestHandler[];
  /** One line for the route list in DEVELOPERS.md and the authorization matrix test. */
  summary: string;
}

/** Every mounted route with its full path: the authorization matrix test walks this. */
export interface MountedRoute {
  method: Method;
  path: string;
  policy: Policy;
  summary: string;
}

/** Mounts routes on a router, each behind its policy, and returns them with their full paths. */
export function mountRoutes(router: Router, base: string, specs: RouteSpec[]): MountedRoute[] {
  return specs.map((s) => {
    if (!s.policy) throw new Error(`Route ${s.method.toUpperCase()} ${base}${s.path} has no policy`);
    router[s.method](base + s.path, authorize(s.policy), ...s.handlers);
    return { method: s.method, path: base + s.path, policy: s.policy, summary: s.summary };
  });
}
