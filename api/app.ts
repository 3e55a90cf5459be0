import path from "node:path";
import express, { type Express } from "express";
import type { AppContext } from "./context";
import { errors } from "./errors";
import { errorHandler } from "./middleware/error-handler";
import { jsonBody } from "./middleware/json-body";
import { malformedPath } from "./middleware/malformed-path";
import { securityHeaders } from "./middleware/security-headers";
import { requestLogging } from "./middleware/request-logging";
import { sessionMiddleware } from "./auth/session-middleware";
import { loopbackOnly, MAILBOX_PATHS } from "./routes/mailbox/loopback-only";
import { mountRoutes } from "./openapi/mount";
import { buildRouteTable } from "./openapi/route-table";

/**
 * Builds the Express app without listening: the API under /api and, when `webDist` is
 * given, the built web app with a history fallback for every other path.
 */
export function createApp(context: AppContext): Express {
  const app = express();
  app.disable("x-powered-by");
  // X-Forwarded-For counts only from the proxies TRUST_PROXY names (none by default).
  app.set("trust proxy", context.env.TRUST_PROXY.length ? context.env.TRUST_PROXY : false);

  app.use(requestLogging(context.logger));
  app.use(securityHeaders({ production: context.env.NODE_ENV === "production" }));
  app.use(malformedPath);
  app.use(MAILBOX_PATHS, loopbackOnly);

  const api = express.Router();
  api.use(jsonBody("1mb"));
  api.use(sessionMiddleware(context.auth));
  // Every /api route is registered in the route table (api/openapi/route-table.ts).
  api.use(
    mountRoutes(buildRouteTable(context), {
      rateLimits: context.rateLimits,
      sequelize: context.sequelize,
      origin: () => context.publicOrigin,
    }),
  );
  api.use((req) => {
    throw errors.routeNotFound(req.method, req.originalUrl.split("?")[0]);
  });
  app.use("/api", api);

  if (context.webDist) {
    const dist = context.webDist;
    // Hashed assets can be cached for good; index.html must be revalidated so a new build is seen.
    app.use(
      "/assets",
      express.static(path.join(dist, "assets"), { immutable: true, maxAge: "1y", fallthrough: false }),
    );
    app.use(express.static(dist, { index: false, maxAge: "1h" }));
    app.get("/{*splat}", (_req, res) => {
      res.set("Cache-Control", "no-cache").sendFile(path.join(dist, "index.html"));
    });
  }

  app.use(errorHandler);
  return app;
}
