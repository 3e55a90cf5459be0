import {
  comparisonPageSchema,
  comparisonParamsSchema,
  comparisonQuerySchema,
} from "../../../core/contract/comparison";
import type { AppContext } from "../../context";
import { defineRoute, type AnyRoute } from "../../openapi/registry";
import { comparisonHandler } from "./handlers";

/** The comparison of every case and combination at every location, with the governing case named. */
export function comparisonRoutes(context: AppContext): AnyRoute[] {
  return [
    defineRoute({
      method: "get",
      path: "/workspaces/{workspaceId}/projects/{projectId}/comparison",
      tag: "comparison",
      summary: "Every load case and combination × location evaluated, with the governing case per criterion",
      description:
        "Stresses in Pa. A factor of null is infinite (the state never reaches the criterion's surface). Combinations are superposed, which assumes linear-elastic behaviour. Rows and skipped pairs come a page at a time (`page`, `limit`); the governing results always cover every row.",
      access: { kind: "member", role: "viewer" },
      request: { params: comparisonParamsSchema, query: comparisonQuerySchema },
      responses: { 200: { description: "One page of the comparison.", schema: comparisonPageSchema } },
      handler: comparisonHandler(context),
    }),
  ];
}
