import { comparisonParamsSchema, comparisonSchema } from "../../../core/contract/comparison";
import { defineRoute, type AnyRoute } from "../../openapi/registry";
import { comparisonHandler } from "./handlers";

/** The comparison of every case and combination at every location, with the governing case named. */
export function comparisonRoutes(): AnyRoute[] {
  return [
    defineRoute({
      method: "get",
      path: "/workspaces/{workspaceId}/projects/{projectId}/comparison",
      tag: "comparison",
      summary: "Every load case and combination × location evaluated, with the governing case per criterion",
      description:
        "Stresses in Pa. A factor of null is infinite (the state never reaches the criterion's surface). Combinations are superposed, which assumes linear-elastic behaviour.",
      access: { kind: "member", role: "viewer" },
      request: { params: comparisonParamsSchema },
      responses: { 200: { description: "The comparison.", schema: comparisonSchema } },
      handler: comparisonHandler,
    }),
  ];
}
