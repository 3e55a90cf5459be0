import type { Request, Response } from "express";
import type { z } from "zod";
import type { Role } from "../../core/contract/workspaces";
import type { RateLimitName } from "../middleware/rate-limit";

/**
 * Who may call a route:
 * - `public`: anyone, signed in or not;
 * - `signed-in`: any signed-in person (401 otherwise);
 * - `member`: a member of the workspace in the `workspaceId` path parameter with at least
 *   `role` (401 signed out, 404 not a member — its existence is not revealed — 403 role too low).
 */
export type Access = { kind: "public" } | { kind: "signed-in" } | { kind: "member"; role: Role };

export type HttpMethod = "get" | "post" | "patch" | "put" | "delete";

/**
 * A documented answer; `schema` absent means no body (204). `contentType` names a body that is not
 * JSON (e.g. "application/pdf", with a string schema of format binary).
 */
export type ResponseSpec = { description: string; schema?: z.ZodType; contentType?: string };

/** What a handler finds in `res.locals.input`: already parsed, never the raw request. */
export type RouteInput<P, Q, B> = { params: P; query: Q; body: B };

export type RouteHandler<P, Q, B> = (
  req: Request,
  res: Response<unknown, { input: RouteInput<P, Q, B> } & Record<string, unknown>>,
) => Promise<void> | void;

/**
 * One API route, everything about it in one place: the Express router, the OpenAPI
 * document and the role-matrix test are all built from these.
 */
export type RouteSpec<P = unknown, Q = unknown, B = unknown> = {
  method: HttpMethod;
  /** OpenAPI-style path under /api, e.g. "/workspaces/{workspaceId}/members". */
  path: string;
  summary: string;
  description?: string;
  /** OpenAPI tag (the resource folder). */
  tag: string;
  access: Access;
  rateLimit?: RateLimitName;
  request?: { params?: z.ZodType<P>; query?: z.ZodType<Q>; body?: z.ZodType<B> };
  /** Successful answers (2xx); the error answers are documented from `access` and `request`. */
  responses: Record<number, ResponseSpec>;
  /** Other error statuses this route can give besides the ones `access` and `request` imply (e.g. 409). */
  errors?: Record<number, string>;
  handler: RouteHandler<P, Q, B>;
};

// The list holds routes of many input types; each route's handler is type-checked where it is defined.
// eslint-disable-next-line @typescript-eslint/no-explicit-any
export type AnyRoute = RouteSpec<any, any, any>;

/** Declares a route with its handler typed from its own schemas. */
export function defineRoute<P = Record<string, never>, Q = Record<string, never>, B = Record<string, never>>(
  spec: RouteSpec<P, Q, B>,
): AnyRoute {
  return spec as AnyRoute;
}

/** "GET /api/workspaces/{workspaceId}": how the OpenAPI document, the registry and the role matrix name a route. */
export function routeKey(route: Pick<AnyRoute, "method" | "path">): string {
  return `${route.method.toUpperCase()} /api${route.path}`;
}
