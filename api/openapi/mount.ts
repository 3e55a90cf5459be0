import { Router, type RequestHandler } from "express";
import type { Sequelize } from "sequelize";
import { currentUser, loadMembership } from "../auth/guards";
import { originCheck } from "../middleware/csrf";
import { rateLimiter, type RateLimitName, type RateLimitSettings } from "../middleware/rate-limit";
import { validate, type ParsedInput } from "../middleware/validate";
import type { AnyRoute } from "./registry";

/** "/workspaces/{workspaceId}" → "/workspaces/:workspaceId" (Express syntax). */
export function expressPath(path: string): string {
  return path.replace(/\{(\w+)\}/g, ":$1");
}

/**
 * Builds the Express router for the registered routes. For each route, in this order:
 * Origin check (state-changing methods) → rate limit → signed in? → path parameters → membership and role → query and body →
 * handler. The role is checked before the body so a non-member learns nothing from a 400.
 */
export function mountRoutes(
  routes: AnyRoute[],
  options: { rateLimits: RateLimitSettings; sequelize: Sequelize; origin: () => string },
): Router {
  const router = Router();
  const limiters = new Map<RateLimitName, RequestHandler>();
  const limiterFor = (name: RateLimitName) => {
    if (!limiters.has(name)) limiters.set(name, rateLimiter(name, options.rateLimits, options.sequelize));
    return limiters.get(name)!;
  };

  for (const route of routes) {
    const chain: RequestHandler[] = [];
    if (route.method !== "get") chain.push(originCheck(options.origin));
    if (route.rateLimit) chain.push(limiterFor(route.rateLimit));
    const access = route.access;
    if (access.kind !== "public") {
      chain.push((_req, res, next) => {
        currentUser(res);
        next();
      });
    }
    const schemas = route.request ?? {};
    chain.push(validate(schemas, ["params"]));
    if (access.kind === "member") {
      chain.push(async (_req, res, next) => {
        const { params } = res.locals.input as ParsedInput & { params: { workspaceId?: string } };
        if (!params.workspaceId)
          throw new Error(`${route.path}: member routes need a {workspaceId} parameter`);
        await loadMembership(res, params.workspaceId, access.role);
        next();
      });
    }
    chain.push(validate(schemas, ["query", "body"]));
    chain.push(async (req, res) => {
      await route.handler(req, res as never);
    });
    router[route.method](expressPath(route.path), ...chain);
  }
  return router;
}
