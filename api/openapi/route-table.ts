import { healthResponseSchema } from "../../core/contract/health";
import type { AppContext } from "../context";
import { devMailboxEnabled } from "../env";
import { accountRoutes } from "../routes/account";
import { authRoutes } from "../routes/auth";
import { healthHandler } from "../routes/health/handler";
import { invitationRoutes } from "../routes/invitations";
import { mailboxRoutes } from "../routes/mailbox";
import { memberRoutes } from "../routes/members";
import { openApiRoutes } from "../routes/openapi";
import { projectAreaRoutes } from "../routes/project-area";
import { shareLinkRoutes } from "../routes/share-links";
import { workspaceRoutes } from "../routes/workspaces";
import { defineRoute, type AnyRoute } from "./registry";

/**
 * Every API route of the app, in one list: the Express router, GET /api/openapi.json and
 * the role-matrix test all read it. A new resource adds its `xxxRoutes(context)` here.
 */
export function buildRouteTable(context: AppContext): AnyRoute[] {
  const health = healthHandler(context.sequelize, context.version);
  const routes: AnyRoute[] = [
    defineRoute({
      method: "get",
      path: "/health",
      tag: "meta",
      summary: "Whether the server and its database answer (503 with the same shape when not)",
      access: { kind: "public" },
      responses: {
        200: { description: "Healthy.", schema: healthResponseSchema },
        503: { description: "The database does not answer.", schema: healthResponseSchema },
      },
      handler: async (req, res) => {
        await health(req, res, () => {});
      },
    }),
    ...authRoutes(context),
    ...accountRoutes(),
    ...workspaceRoutes(context),
    ...memberRoutes(context),
    ...invitationRoutes(context),
    ...shareLinkRoutes(context),
    ...projectAreaRoutes(context),
    ...(devMailboxEnabled(context.env) ? mailboxRoutes() : []),
  ];
  routes.push(...openApiRoutes(context, () => routes));
  return routes;
}
